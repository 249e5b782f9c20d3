import {
  DECK_POSITION_KINDS,
  type DeckPositionKind,
  type DeckPositionView,
  type RespotTarget,
  type RespotTow,
  type RespotView,
} from '@catline/contracts';
import { ApiProperty, ApiSchema } from '@nestjs/swagger';
import { EnumProperty, IdProperty, InstantProperty } from './fields.js';

@ApiSchema({ name: 'DeckPositionView', description: 'A deck spot, an elevator or a hangar bay.' })
export class DeckPositionViewDto implements DeckPositionView {
  @EnumProperty(DECK_POSITION_KINDS, 'DeckPositionKind')
  kind: DeckPositionKind;

  @ApiProperty({ description: "The spot's, elevator's or hangar bay's name in the ship's deck layout." })
  name: string;
}

@ApiSchema({ name: 'RespotTarget', description: 'Where one aircraft is to be after the respot.' })
export class RespotTargetViewDto implements RespotTarget {
  @IdProperty()
  slotId: number;

  @ApiProperty({ type: () => DeckPositionViewDto })
  to: DeckPositionView;
}

@ApiSchema({ name: 'RespotTow', description: 'One tow of the respot, in the order the deck crew makes them.' })
export class RespotTowViewDto implements RespotTow {
  @IdProperty()
  slotId: number;

  @ApiProperty({ type: () => DeckPositionViewDto })
  from: DeckPositionView;

  @ApiProperty({ type: () => DeckPositionViewDto })
  to: DeckPositionView;

  @InstantProperty({ nullable: true, description: 'When it was ticked off; null while still to do.' })
  doneAt: string | null;
}

@ApiSchema({ name: 'RespotView', description: 'The respot for the coming recovery: its targets and ordered tows.' })
export class RespotViewDto implements RespotView {
  @ApiProperty({ type: () => [RespotTargetViewDto] })
  targets: RespotTarget[];

  @ApiProperty({ type: () => [RespotTowViewDto] })
  tows: RespotTow[];
}
