import type { LineupCommandResult } from '@catline/contracts';
import { Body, Controller, HttpCode, HttpStatus, Param, ParseIntPipe, Post } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import type { AuthenticatedUser } from '../common/authenticated-user.js';
import { CurrentUser } from '../common/decorators/current-user.decorator.js';
import { Roles } from '../common/decorators/roles.decorator.js';
import { ApiDoc } from '../common/openapi/api-doc.decorator.js';
import { LineupCommandResultDto } from '../common/openapi/views/lineup.view.js';
import { actorOf } from '../cycle-changes/cycle-change.service.js';
import { SetLoadDto } from './dto/set-load.dto.js';
import { SlotLoadService } from './slot-load.service.js';

// What a slot carries; the command answers 200 with the accepted change.
@ApiTags('lineup')
@Controller('cycles/:cycleId/lineup/slots/:slotId')
export class SlotLoadController {
  constructor(private readonly load: SlotLoadService) {}

  @ApiDoc('Set the fuel on board and the stores of an aircraft', {
    response: LineupCommandResultDto,
    description:
      "The planned gross weight becomes the type's operating weight with crew plus fuel plus stores; once the weight was agreed, the catapult work on it drops back for re-verify.",
    refuses: {
      400: ['stores_not_in_catalogue'],
      404: ['not_found'],
      409: ['wrong_step', 'no_change', 'operating_weight_missing', 'stale_basis', 'cycle_closed'],
    },
  })
  @Roles('handler', 'air_operations')
  @Post('load')
  @HttpCode(HttpStatus.OK)
  setLoad(
    @Param('cycleId', ParseIntPipe) cycleId: number,
    @Param('slotId', ParseIntPipe) slotId: number,
    @Body() body: SetLoadDto,
    @CurrentUser() user: AuthenticatedUser,
  ): Promise<LineupCommandResult> {
    return this.load.setLoad(cycleId, actorOf(user), slotId, body);
  }
}
