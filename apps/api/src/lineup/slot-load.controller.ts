import type { LineupCommandResult } from '@catline/contracts';
import { Body, Controller, HttpCode, HttpStatus, Param, ParseIntPipe, Post } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import type { AuthenticatedUser } from '../common/authenticated-user.js';
import { CurrentUser } from '../common/decorators/current-user.decorator.js';
import { Roles } from '../common/decorators/roles.decorator.js';
import { ApiDoc } from '../common/openapi/api-doc.decorator.js';
import { LineupCommandResultDto } from '../common/openapi/views/lineup.view.js';
import { actorOf } from '../cycle-changes/cycle-change.service.js';
import { SetArmStateDto } from './dto/set-arm-state.dto.js';
import { SetLoadDto } from './dto/set-load.dto.js';
import { SlotArmStateService } from './slot-arm-state.service.js';
import { SlotLoadService } from './slot-load.service.js';

// What a slot carries and whether it is armed; each command answers 200 with the accepted change.
@ApiTags('lineup')
@Controller('cycles/:cycleId/lineup/slots/:slotId')
export class SlotLoadController {
  constructor(
    private readonly load: SlotLoadService,
    private readonly arming: SlotArmStateService,
  ) {}

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

  @ApiDoc('Record an aircraft armed or safe', {
    response: LineupCommandResultDto,
    description:
      "The handler records it for any aircraft of the cycle; the catapult officer and the deck edge operator only for one in their catapult's order.",
    refuses: {
      403: ['not_your_catapult'],
      404: ['not_found'],
      409: ['wrong_step', 'no_change', 'stale_basis', 'cycle_closed'],
    },
  })
  @Roles('handler', 'catapult_officer', 'deck_edge_operator')
  @Post('arm-state')
  @HttpCode(HttpStatus.OK)
  setArmState(
    @Param('cycleId', ParseIntPipe) cycleId: number,
    @Param('slotId', ParseIntPipe) slotId: number,
    @Body() body: SetArmStateDto,
    @CurrentUser() user: AuthenticatedUser,
  ): Promise<LineupCommandResult> {
    return this.arming.setArmState(cycleId, user, slotId, body);
  }
}
