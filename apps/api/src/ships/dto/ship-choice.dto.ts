import type { ShipChoice } from '@catline/contracts';
import { ApiPropertyOptional } from '@nestjs/swagger';
import { IsInt, Min } from 'class-validator';
import { SkipIfAbsent } from '../../common/validation/skip-if-absent.decorator.js';

/** The `shipId` of a request that adds a ship-owned row (see owner-ship.ts). */
export class ShipChoiceDto implements ShipChoice {
  @ApiPropertyOptional({
    type: 'integer',
    minimum: 1,
    description: "The ship it belongs to. Left out, the caller's own; a fleet admin must give it.",
  })
  @SkipIfAbsent()
  @IsInt()
  @Min(1)
  shipId?: number;
}
