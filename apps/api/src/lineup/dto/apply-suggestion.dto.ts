import type { ApplySuggestionRequest } from '@catline/contracts';
import { ApiProperty } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { ArrayMaxSize, IsArray, IsInt, ValidateNested } from 'class-validator';
import { IdField, VersionField } from './fields.js';

export class SuggestedLaneDto {
  @IdField()
  catapultId: number;

  @ApiProperty({
    type: 'integer',
    isArray: true,
    description: 'Planned slots to queue behind the aircraft already launched or in readiness.',
  })
  @IsArray()
  @ArrayMaxSize(200)
  @IsInt({ each: true, message: 'slotIds must hold slot ids' })
  slotIds: number[];
}

export class ApplySuggestionDto implements ApplySuggestionRequest {
  @VersionField('The cycle version the suggestion was made from.')
  basisVersion: number;

  @ApiProperty({ type: [SuggestedLaneDto] })
  @IsArray()
  @ArrayMaxSize(8)
  @ValidateNested({ each: true })
  @Type(() => SuggestedLaneDto)
  lanes: SuggestedLaneDto[];
}
