import { DECK_POSITION_KINDS, type DeckPositionKind, type TowAircraftRequest } from '@catline/contracts';
import { ApiProperty } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { IsIn, IsNotEmpty, IsString, MaxLength, ValidateNested } from 'class-validator';
import { PlainText } from '../../common/validation/plain-text.decorator.js';
import { Trim } from '../../common/validation/trim.decorator.js';
import { IdField, VersionField } from '../../lineup/dto/fields.js';

export class DeckPositionDto {
  @ApiProperty({ enum: DECK_POSITION_KINDS })
  @IsIn(DECK_POSITION_KINDS, { message: `kind must be one of ${DECK_POSITION_KINDS.join(', ')}` })
  kind: DeckPositionKind;

  @ApiProperty({ example: 'bow-2', maxLength: 20 })
  @Trim()
  @IsString()
  @IsNotEmpty({ message: 'a position needs a name' })
  @PlainText()
  @MaxLength(20)
  name: string;
}

export class TowAircraftDto implements TowAircraftRequest {
  @IdField('The slot of the aircraft to tow.')
  slotId: number;

  @ApiProperty({ type: DeckPositionDto })
  @ValidateNested()
  @Type(() => DeckPositionDto)
  to: DeckPositionDto;

  @VersionField('The slot version the tow is based on.')
  slotVersion: number;
}
