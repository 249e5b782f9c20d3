import type { MoveSlotRequest } from '@catline/contracts';
import { ApiProperty } from '@nestjs/swagger';
import { ArrayMaxSize, IsArray, IsInt, Max, Min, ValidateIf } from 'class-validator';
import { IdField, MAX_ID, VersionField } from './fields.js';

export class MoveSlotDto implements MoveSlotRequest {
  @IdField()
  slotId: number;

  @VersionField('The slot version the move is based on.')
  slotVersion: number;

  @ApiProperty({ type: 'integer', nullable: true, description: 'The target catapult, or null for the deck pool.' })
  @ValidateIf((_dto, value) => value !== null)
  @IsInt({ message: 'toCatapultId must be a catapult id or null' })
  @Min(1)
  @Max(MAX_ID)
  toCatapultId: number | null;

  @ApiProperty({ minimum: 0, description: '0-based place in the target lane; ignored for the deck pool.' })
  @IsInt()
  @Min(0)
  @Max(999)
  toIndex: number;

  @ApiProperty({
    type: 'integer',
    isArray: true,
    description: "The target lane's slot ids as seen before the move; ignored for the deck pool.",
  })
  @IsArray()
  @ArrayMaxSize(200)
  @IsInt({ each: true, message: 'targetLaneOrder must hold slot ids' })
  targetLaneOrder: number[];
}
