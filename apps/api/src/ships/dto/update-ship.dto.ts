import { ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import {
  ArrayMaxSize,
  ArrayMinSize,
  IsArray,
  IsInt,
  IsNotEmpty,
  IsObject,
  IsString,
  Max,
  MaxLength,
  Min,
  ValidateNested,
} from 'class-validator';
import { SkipIfAbsent } from '../../common/validation/skip-if-absent.decorator.js';
import { Trim } from '../../common/validation/trim.decorator.js';
import { DeckSpotDto } from './deck-spot.dto.js';
import { ShipProfileDto } from './ship-profile.dto.js';
import { PlainText } from '../../common/validation/plain-text.decorator.js';

export class UpdateShipDto {
  @ApiPropertyOptional()
  @SkipIfAbsent()
  @Trim()
  @IsString()
  @IsNotEmpty({ message: 'name must not be blank' })
  @PlainText()
  @MaxLength(120)
  name?: string;

  @ApiPropertyOptional()
  @SkipIfAbsent()
  @Trim()
  @IsString()
  @IsNotEmpty({ message: 'hullCode must not be blank' })
  @PlainText()
  @MaxLength(20)
  hullCode?: string;

  @ApiPropertyOptional({ minimum: 0, maximum: 600, description: 'Seconds between launches of a catapult pair.' })
  @SkipIfAbsent()
  @IsInt()
  @Min(0)
  @Max(600)
  pairGapS?: number;

  @ApiPropertyOptional({ type: ShipProfileDto })
  @SkipIfAbsent()
  @IsObject()
  @ValidateNested()
  @Type(() => ShipProfileDto)
  profile?: ShipProfileDto;

  @ApiPropertyOptional({ type: [DeckSpotDto] })
  @SkipIfAbsent()
  @IsArray()
  @ArrayMinSize(1, { message: 'deckSpots must list at least one spot' })
  @ArrayMaxSize(200)
  @ValidateNested({ each: true })
  @Type(() => DeckSpotDto)
  deckSpots?: DeckSpotDto[];
}
