import type { BuildRespotRequest, RespotTarget, RespotTowDoneRequest } from '@catline/contracts';
import { ApiProperty } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { ArrayMaxSize, IsArray, ValidateNested } from 'class-validator';
import { IdField, VersionField } from '../../lineup/dto/fields.js';
import { DeckPositionDto } from './tow-aircraft.dto.js';

export class RespotTargetDto implements RespotTarget {
  @IdField('The slot of the aircraft.')
  slotId: number;

  @ApiProperty({
    type: DeckPositionDto,
    description: 'Where it is to be after the respot (or, airborne, where it lands).',
  })
  @ValidateNested()
  @Type(() => DeckPositionDto)
  to: DeckPositionDto;
}

export class BuildRespotDto implements BuildRespotRequest {
  @ApiProperty({ type: [RespotTargetDto], maxItems: 200 })
  @IsArray()
  @ArrayMaxSize(200)
  @ValidateNested({ each: true })
  @Type(() => RespotTargetDto)
  targets: RespotTargetDto[];

  @VersionField('The cycle version the respot is based on.')
  basisVersion: number;
}

export class RespotTowDoneDto implements RespotTowDoneRequest {
  @VersionField('The cycle version the tick is based on.')
  basisVersion: number;
}
