import {
  AIRCRAFT_CLASSES,
  type AircraftClass,
  ARM_STATES,
  type ArmState,
  CHANGE_KINDS,
  type DeckPositionView,
  type ChangeActor,
  type ChangeKind,
  type CrosswindSide,
  type LaneView,
  LAUNCH_GATE_CODES,
  type LaunchGateCode,
  type LaunchGateView,
  LAUNCH_RECORD_SOURCES,
  type LaunchFiredBy,
  type LaunchRecord,
  type LaunchRecordSource,
  type LaunchFigures,
  type LaunchTimingView,
  type LineupChange,
  type LineupCommandResult,
  type LineupPatch,
  type LineupSnapshot,
  NO_GO_CODES,
  type NoGoCode,
  type NoGoReason,
  type ProjectedLaunch,
  REVERIFY_CAUSES,
  type ReverifyCause,
  type SettingReadBackView,
  ROLES,
  type Role,
  SLOT_STATUSES,
  READINESS_STEPS,
  type ReadinessStep,
  SOFT_LAUNCH_GATE_CODES,
  type SoftLaunchGateCode,
  TIMING_VERDICTS,
  type TimingAgainstView,
  type TimingVerdict,
  type SlotStatus,
  type SlotView,
  type SlotStoresLine,
  type GrossWeightPartsView,
  type SpareCandidate,
  type SpareMatch,
  type SuggestedLineup,
  type WaiverView,
  type WindReadingUsed,
} from '@catline/contracts';
import { ApiProperty, ApiSchema } from '@nestjs/swagger';
import { CycleViewDto } from './cycles.view.js';
import { DeckPositionViewDto } from './deck.view.js';
import { EnumProperty, IdProperty, InstantProperty, IntProperty } from './fields.js';
import { PageDto } from './paging.view.js';
import { CATAPULT_POSITIONS, CATAPULT_STATUSES } from './fleet.view.js';

const CROSSWIND_SIDES: CrosswindSide[] = ['port', 'starboard', 'none'];

@ApiSchema({ name: 'NoGoReason' })
export class NoGoReasonDto implements NoGoReason {
  @EnumProperty(NO_GO_CODES, 'NoGoCode')
  code: NoGoCode;

  @ApiProperty({ description: 'A sentence for the deck crew, with the figures that caused it.' })
  message: string;
}

@ApiSchema({ name: 'LaunchFigures', description: 'The figures of one aircraft on one catapult under the conditions.' })
export class LaunchFiguresDto implements LaunchFigures {
  @ApiProperty({ description: 'Knots.' })
  headwindKt: number;

  @ApiProperty({ description: 'Knots.' })
  crosswindKt: number;

  @EnumProperty(CROSSWIND_SIDES, 'CrosswindSide')
  crosswindSide: CrosswindSide;

  @IntProperty({
    nullable: true,
    description:
      "From the ship's approved launch data for the catapult, type and configuration; null when it gives none.",
  })
  catapultSetting: number | null;

  @IntProperty({
    nullable: true,
    description: "The energy model's setting, the cross-check; null when no setting reaches the end speed wanted.",
  })
  crossCheckSetting: number | null;

  @ApiProperty({
    type: Boolean,
    nullable: true,
    description:
      "The cross-check differs from the approved setting by more than the ship's tolerance; null where not judged.",
  })
  crossCheckFlagged: boolean | null;

  @ApiProperty({ description: 'Knots.' })
  endSpeedKt: number;

  @ApiProperty({ type: Number, nullable: true, description: 'Knots; null outside the launch table.' })
  requiredAirspeedKt: number | null;

  @ApiProperty({ type: Number, nullable: true, description: 'Knots; null outside the launch table.' })
  requiredWindOverDeckKt: number | null;

  @ApiProperty({ type: Number, nullable: true, description: 'Knots; null outside the launch table.' })
  marginKt: number | null;

  @ApiProperty({
    type: Number,
    nullable: true,
    description: 'Headwind less (minimum launch airspeed - end speed), knots; null outside the launch table.',
  })
  excessWindOverDeckKt: number | null;

  @ApiProperty({ type: Number, nullable: true, description: "The type's recommended excess wind over deck, knots." })
  recommendedExcessKt: number | null;

  @ApiProperty()
  go: boolean;

  @ApiProperty({ type: [NoGoReasonDto] })
  reasons: NoGoReason[];

  @ApiProperty({ description: 'Degrees; positive to starboard, 0 for none (night).' })
  clearingTurnDeg: number;
}

@ApiSchema({ name: 'WindReadingUsed', description: 'The wind over the deck as read when the aircraft was fired.' })
export class WindReadingUsedDto implements WindReadingUsed {
  @InstantProperty({ nullable: true, description: 'When the reading was taken; null when none was kept.' })
  readAt: string | null;

  @ApiProperty({ description: 'Degrees true.' })
  shipCourseDeg: number;

  @ApiProperty({ description: 'Knots.' })
  shipSpeedKt: number;

  @ApiProperty({ description: 'Direction the true wind blew from, degrees true.' })
  trueWindFromDeg: number;

  @ApiProperty({ description: 'Knots.' })
  trueWindSpeedKt: number;

  @ApiProperty({
    type: Number,
    nullable: true,
    description: 'Direction the gust blew from, degrees true; null when the record kept no spread.',
  })
  windGustFromDeg: number | null;

  @ApiProperty({ type: Number, nullable: true, description: 'Knots, as a true wind; null when none was kept.' })
  windGustKt: number | null;

  @ApiProperty({
    type: Number,
    nullable: true,
    description: 'Direction the lull blew from, degrees true; null when the record kept no spread.',
  })
  windLullFromDeg: number | null;

  @ApiProperty({
    type: Number,
    nullable: true,
    description: 'Knots, as a true wind; the headwind rests on it. Null when none was kept.',
  })
  windLullKt: number | null;

  @ApiProperty({ description: 'Where the wind across the deck blew from off the bow, degrees, negative to port.' })
  relativeWindBearingDeg: number;

  @ApiProperty({ description: 'Speed of the wind across the deck, knots.' })
  relativeWindSpeedKt: number;

  @ApiProperty({ description: 'Degrees Celsius.' })
  temperatureC: number;

  @ApiProperty({ description: 'Hectopascals.' })
  pressureHpa: number;
}

@ApiSchema({ name: 'LaunchFiredBy', description: 'Who gave the launch command.' })
export class LaunchFiredByDto implements LaunchFiredBy {
  @IdProperty({ nullable: true, description: 'Null when only the name was kept.' })
  id: number | null;

  @ApiProperty()
  name: string;

  @EnumProperty(ROLES, 'Role', { nullable: true })
  role: Role | null;
}

@ApiSchema({ name: 'LaunchRecord', description: 'What was used with the shot, frozen at the launch command.' })
export class LaunchRecordDto implements LaunchRecord {
  @EnumProperty(LAUNCH_RECORD_SOURCES, 'LaunchRecordSource')
  source: LaunchRecordSource;

  @InstantProperty()
  launchedAt: string;

  @IdProperty()
  catapultId: number;

  @IntProperty({ minimum: 1 })
  catapultNumber: number;

  @IntProperty({ minimum: 0, description: 'The agreed gross weight, pounds.' })
  grossWeightLb: number;

  @IntProperty({ minimum: 0 })
  fuelLb: number;

  @ApiProperty()
  stores: string;

  @IntProperty({ nullable: true, description: "The setting of the ship's approved launch data." })
  launchDataSetting: number | null;

  @IntProperty({ nullable: true, description: "Catline's estimate from the catapult's energy model." })
  crossCheckSetting: number | null;

  @ApiProperty({ type: () => WindReadingUsedDto, nullable: true })
  windReading: WindReadingUsed | null;

  @ApiProperty({ type: Number, nullable: true, description: 'Knots.' })
  headwindKt: number | null;

  @ApiProperty({ type: Number, nullable: true, description: 'Knots.' })
  crosswindKt: number | null;

  @EnumProperty(CROSSWIND_SIDES, 'CrosswindSide', { nullable: true })
  crosswindSide: CrosswindSide | null;

  @ApiProperty({ type: Number, nullable: true, description: 'Knots.' })
  endSpeedKt: number | null;

  @ApiProperty({ type: Number, nullable: true, description: 'Knots.' })
  requiredAirspeedKt: number | null;

  @ApiProperty({ type: Number, nullable: true, description: 'Knots.' })
  requiredWindOverDeckKt: number | null;

  @ApiProperty({ type: Number, nullable: true, description: 'The launch margin, knots.' })
  excessWindKt: number | null;

  @ApiProperty({
    type: Number,
    nullable: true,
    description: 'The excess wind over deck shown at the shot, knots; null in a record kept before it was.',
  })
  excessWindOverDeckKt: number | null;

  @ApiProperty({
    type: Number,
    nullable: true,
    description:
      "The type's recommended excess wind over deck at the shot, knots; null in a record kept before it was.",
  })
  recommendedExcessKt: number | null;

  @ApiProperty({ type: Boolean, nullable: true })
  go: boolean | null;

  @ApiProperty({ type: [NoGoReasonDto] })
  reasons: NoGoReason[];

  @ApiProperty({ type: Number, nullable: true, description: 'Degrees.' })
  trimDeg: number | null;

  @ApiProperty({ type: Boolean, nullable: true })
  afterburnerRequired: boolean | null;

  @ApiProperty({ type: Number, nullable: true, description: 'Degrees, positive to starboard.' })
  clearingTurnDeg: number | null;

  @ApiProperty({ type: String, nullable: true, description: 'The reason given to launch on a no-go figure.' })
  waiver: string | null;

  @ApiProperty({ type: () => LaunchFiredByDto, nullable: true })
  firedBy: LaunchFiredBy | null;
}

@ApiSchema({ name: 'WaiverView', description: 'A soft gate the air boss waived for one aircraft.' })
export class WaiverViewDto implements WaiverView {
  @EnumProperty(SOFT_LAUNCH_GATE_CODES, 'SoftLaunchGateCode')
  gate: SoftLaunchGateCode;

  @ApiProperty()
  reason: string;

  @ApiProperty()
  by: string;

  @InstantProperty()
  at: string;
}

@ApiSchema({
  name: 'SettingReadBackView',
  description: 'The two-person check of the setting: the figure on the console, equal to the approved one.',
})
export class SettingReadBackViewDto implements SettingReadBackView {
  @IntProperty()
  setting: number;

  @IntProperty({ description: 'The agreed weight the setting is for, pounds.' })
  weightLb: number;

  @ApiProperty({ description: 'Who recorded the agreed weight the setting was set for.' })
  setBy: string;

  @ApiProperty({ description: 'Who read the setting back from the console; may be the same person.' })
  readBackBy: string;

  @InstantProperty()
  at: string;
}

@ApiSchema({ name: 'LaunchGateView', description: 'A launch gate closed for an aircraft.' })
export class LaunchGateViewDto implements LaunchGateView {
  @EnumProperty(LAUNCH_GATE_CODES, 'LaunchGateCode')
  gate: LaunchGateCode;

  @ApiProperty({ description: 'Soft gates may be waived by the air boss; hard ones refuse the shot.' })
  soft: boolean;

  @ApiProperty()
  waived: boolean;

  @ApiProperty({ description: 'A sentence for the deck crew, with the figures that close it.' })
  message: string;
}

@ApiSchema({ name: 'SlotStoresLine' })
export class SlotStoresLineDto implements SlotStoresLine {
  @ApiProperty({ description: "An item of the type's stores catalogue." })
  name: string;

  @IntProperty({ minimum: 1, description: 'Weight of one item when loaded, pounds.' })
  weightEachLb: number;

  @IntProperty({ minimum: 1 })
  count: number;
}

@ApiSchema({ name: 'GrossWeightStoresLine' })
export class GrossWeightStoresLineDto extends SlotStoresLineDto {
  @IntProperty({ minimum: 0, description: 'Weight each × count, pounds.' })
  weightLb: number;
}

@ApiSchema({ name: 'GrossWeightPartsView' })
export class GrossWeightPartsViewDto implements GrossWeightPartsView {
  @IntProperty({ minimum: 0, description: "The type's operating weight with crew when the load was set, pounds." })
  operatingWeightLb: number;

  @IntProperty({ minimum: 0, description: 'Pounds.' })
  fuelLb: number;

  @ApiProperty({ type: [GrossWeightStoresLineDto] })
  stores: GrossWeightStoresLineDto[];

  @IntProperty({ minimum: 0, description: 'Pounds.' })
  storesWeightLb: number;

  @IntProperty({ minimum: 0, description: 'Operating weight + fuel + stores, pounds.' })
  grossWeightLb: number;
}

@ApiSchema({ name: 'TimingAgainst', description: 'How a launch time runs against a reference, in whole minutes.' })
class TimingAgainstDto implements TimingAgainstView {
  @EnumProperty(TIMING_VERDICTS, 'TimingVerdict')
  verdict: TimingVerdict;

  @ApiProperty({ description: 'Minutes early or late; for an on-time launch against the window, minutes to spare.' })
  minutes: number;
}

@ApiSchema({
  name: 'LaunchTiming',
  description: 'How a launch runs against its window end and, once launching, against the plan.',
})
class LaunchTimingDto implements LaunchTimingView {
  @ApiProperty({ type: () => TimingAgainstDto, description: 'Late by the minutes started after the window end.' })
  window: TimingAgainstView;

  @ApiProperty({
    type: () => TimingAgainstDto,
    nullable: true,
    description: 'Against the lineup projected from the planned start; null until launching.',
  })
  plan: TimingAgainstView | null;
}

@ApiSchema({ name: 'SlotView', description: 'One aircraft of a cycle: where it stands in the lineup and its figures.' })
export class SlotViewDto implements SlotView {
  @IdProperty()
  id: number;

  @IdProperty()
  cycleId: number;

  @IdProperty()
  aircraftId: number;

  @ApiProperty()
  sideNumber: string;

  @IdProperty()
  typeId: number;

  @ApiProperty()
  typeDesignation: string;

  @EnumProperty(AIRCRAFT_CLASSES, 'AircraftClass', {
    description: "Which of the ship's departures the aircraft flies.",
  })
  aircraftClass: AircraftClass;

  @IdProperty()
  squadronId: number;

  @ApiProperty()
  squadronCode: string;

  @IdProperty({ nullable: true })
  pilotId: number | null;

  @ApiProperty({ type: String, nullable: true })
  pilotName: string | null;

  @ApiProperty()
  mission: string;

  @IntProperty({ minimum: 0 })
  fuelLb: number;

  @ApiProperty({ description: 'The stores in words.' })
  stores: string;

  @ApiProperty({ type: [SlotStoresLineDto], description: 'Empty while the planned weight is the one typed in.' })
  storesList: SlotStoresLine[];

  @IntProperty({ minimum: 0 })
  grossWeightLb: number;

  @ApiProperty({ type: GrossWeightPartsViewDto, nullable: true, description: 'Null while the weight is typed in.' })
  grossWeightParts: GrossWeightPartsView | null;

  @ApiProperty({ enum: ARM_STATES, nullable: true, description: 'Armed or safe as last recorded; null until then.' })
  armState: ArmState | null;

  @InstantProperty({ nullable: true, description: 'When armed or safe was last recorded.' })
  armStateAt: string | null;

  @ApiProperty({ type: String, nullable: true, description: 'Who recorded it.' })
  armStateBy: string | null;

  @ApiProperty()
  tanker: boolean;

  @ApiProperty()
  earlyWarning: boolean;

  @ApiProperty()
  spare: boolean;

  @ApiProperty({ description: 'A spare not yet called: in no lane and not counted until called for a down aircraft.' })
  heldSpare: boolean;

  @IdProperty({ nullable: true, description: 'Null while the slot is in the deck pool.' })
  catapultId: number | null;

  @IdProperty({
    nullable: true,
    description: 'The catapult whose order a down aircraft left; null while not down, or down from the deck pool.',
  })
  downFromCatapultId: number | null;

  @IntProperty({ nullable: true, minimum: 0, description: '0-based place in its lane; null in the deck pool.' })
  position: number | null;

  @EnumProperty(SLOT_STATUSES, 'SlotStatus')
  status: SlotStatus;

  @IntProperty({ minimum: 0, description: 'Bumped by every change to this slot; the basis of commands on it.' })
  version: number;

  @ApiProperty({ type: Number, nullable: true, description: 'Degrees.' })
  trimDeg: number | null;

  @ApiProperty()
  afterburnerRequired: boolean;

  @ApiProperty({ description: "The ship profile's departure for the cycle's weather case and the aircraft's class." })
  departure: string;

  @InstantProperty({ nullable: true })
  pilotWeightAckAt: string | null;

  @ApiProperty({ type: Number, nullable: true, description: 'The figure the pilot answered from the tablet, lb.' })
  pilotWeightAckLb: number | null;

  @ApiProperty({
    type: Number,
    nullable: true,
    description: 'The gross weight the crew recorded as agreed, lb; the setting is worked out from it.',
  })
  agreedWeightLb: number | null;

  @InstantProperty({ nullable: true })
  catapultWeightAckAt: string | null;

  @ApiProperty({ type: String, nullable: true, description: 'Who recorded the agreed weight; null while none is.' })
  weightAgreedBy: string | null;

  @ApiProperty({
    type: () => SettingReadBackViewDto,
    nullable: true,
    description: 'The setting read back from the console; null until read back, and after a drop-back before it.',
  })
  settingReadBack: SettingReadBackView | null;

  @ApiProperty({
    type: String,
    nullable: true,
    description: "The holdback release element the aircraft's type is launched with; null while not recorded.",
  })
  holdbackElement: string | null;

  @ApiProperty({ type: String, nullable: true })
  suspendReason: string | null;

  @ApiProperty({ type: String, nullable: true })
  overrideReason: string | null;

  @InstantProperty({ nullable: true })
  launchedAt: string | null;

  @InstantProperty({ nullable: true, description: 'When the status last changed.' })
  statusAt: string | null;

  @ApiProperty({ type: String, nullable: true, description: 'Who last changed the status.' })
  statusBy: string | null;

  @InstantProperty({ nullable: true })
  projectedLaunchAt: string | null;

  @ApiProperty()
  missesWindow: boolean;

  @ApiProperty({ type: () => LaunchTimingDto, nullable: true, description: 'Null without a launch time.' })
  timing: LaunchTimingView | null;

  @ApiProperty({ type: () => LaunchFiguresDto, nullable: true, description: 'Null in the deck pool.' })
  figures: LaunchFigures | null;

  @ApiProperty({
    type: () => LaunchRecordDto,
    nullable: true,
    description: 'What was used with the shot; null until launched.',
  })
  launchRecord: LaunchRecord | null;

  @EnumProperty(REVERIFY_CAUSES, 'ReverifyCause', {
    nullable: true,
    description: 'What changed under the agreed figures since they were verified; null when nothing waits.',
  })
  reverifyCause: ReverifyCause | null;

  @ApiProperty({ type: [WaiverViewDto] })
  waivers: WaiverView[];

  @ApiProperty({ type: [LaunchGateViewDto], nullable: true, description: 'Null in the deck pool.' })
  gates: LaunchGateView[] | null;

  @ApiProperty({ type: () => DeckPositionViewDto, nullable: true, description: 'Where it is; null once launched.' })
  deckPosition: DeckPositionView | null;

  @ApiProperty({
    type: [String],
    description: 'Side numbers of the aircraft parked in front that must move before this one can taxi out.',
  })
  mustMove: string[];
}

@ApiSchema({ name: 'LaneView', description: "A catapult's lane of the lineup." })
export class LaneViewDto implements LaneView {
  @IdProperty()
  catapultId: number;

  @IntProperty({ minimum: 1 })
  number: number;

  @EnumProperty(CATAPULT_POSITIONS, 'CatapultPosition')
  position: LaneView['position'];

  @EnumProperty(CATAPULT_STATUSES, 'CatapultStatus')
  status: LaneView['status'];

  @ApiProperty({ description: 'Waist catapults are closed while the landing area is in use.' })
  closed: boolean;

  @ApiProperty({ description: "The air boss's deck status: clear to launch from this catapult, or not." })
  deckClear: boolean;

  @ApiProperty({ type: 'string', nullable: true, description: 'Why the deck is not clear; null when clear.' })
  deckHoldReason: string | null;

  @ApiProperty({ type: 'integer', isArray: true, description: "The lane's slots in launch order." })
  slotIds: number[];

  @ApiProperty({
    enum: READINESS_STEPS,
    isArray: true,
    description: "The readiness steps this catapult runs, in order: its own list, or the ship's.",
  })
  readinessSteps: ReadinessStep[];

  @ApiProperty({ description: 'True when every slot still to launch in the lane is go.' })
  go: boolean;

  @ApiProperty({ description: 'Knots.' })
  headwindKt: number;

  @ApiProperty({ description: 'Knots.' })
  crosswindKt: number;

  @EnumProperty(CROSSWIND_SIDES, 'CrosswindSide')
  crosswindSide: CrosswindSide;
}

@ApiSchema({ name: 'LineupSnapshot', description: "A cycle's whole lineup at one version." })
export class LineupSnapshotDto implements LineupSnapshot {
  @ApiProperty({ enum: READINESS_STEPS, isArray: true, description: "The ship's readiness steps, in order." })
  readinessSteps: ReadinessStep[];

  @ApiProperty({ type: () => CycleViewDto })
  cycle: CycleViewDto;

  @ApiProperty({ type: [LaneViewDto] })
  lanes: LaneView[];

  @ApiProperty({ type: 'integer', isArray: true, description: 'Slots in the deck pool, by side number.' })
  pool: number[];

  @ApiProperty({ type: [SlotViewDto] })
  slots: SlotView[];

  @InstantProperty({ nullable: true })
  lastLaunchAt: string | null;

  @IntProperty({ minimum: 0 })
  version: number;
}

@ApiSchema({ name: 'LineupPatch', description: 'What changed: replace these parts of the snapshot, by id.' })
export class LineupPatchDto implements LineupPatch {
  @ApiProperty({ type: () => CycleViewDto, required: false })
  cycle?: CycleViewDto;

  @ApiProperty({ type: [LaneViewDto], required: false })
  lanes?: LaneView[];

  @ApiProperty({ type: 'integer', isArray: true, required: false })
  pool?: number[];

  @ApiProperty({ type: [SlotViewDto], required: false })
  slots?: SlotView[];

  @InstantProperty({ nullable: true, required: false })
  lastLaunchAt?: string | null;
}

@ApiSchema({ name: 'ChangeActor' })
export class ChangeActorDto implements ChangeActor {
  @IdProperty()
  id: number;

  @ApiProperty()
  name: string;

  @EnumProperty(ROLES, 'Role')
  role: Role;
}

@ApiSchema({ name: 'LineupChange', description: 'One accepted change, as kept in the change log and broadcast.' })
export class LineupChangeDto implements LineupChange {
  @IdProperty()
  cycleId: number;

  @IntProperty({ minimum: 1 })
  version: number;

  @EnumProperty(CHANGE_KINDS, 'ChangeKind')
  kind: ChangeKind;

  @ApiProperty({ type: () => ChangeActorDto })
  actor: ChangeActor;

  @InstantProperty()
  at: string;

  @ApiProperty({ description: 'A one-line account for people.' })
  summary: string;

  @ApiProperty({ type: () => LineupPatchDto })
  patch: LineupPatch;
}

export const LineupChangePageDto = PageDto(
  LineupChangeDto,
  'LineupChange',
  'One page of a cycle’s changes, in version order.',
);

@ApiSchema({ name: 'LineupCommandResult', description: 'The accepted change and the version it made.' })
export class LineupCommandResultDto implements LineupCommandResult {
  @IntProperty({ minimum: 1 })
  version: number;

  @ApiProperty({ type: () => LineupChangeDto })
  change: LineupChange;
}

@ApiSchema({ name: 'SuggestedLane' })
export class SuggestedLaneDto {
  @IdProperty()
  catapultId: number;

  @ApiProperty({ type: 'integer', isArray: true })
  slotIds: number[];
}

@ApiSchema({ name: 'ProjectedLaunch', description: "One aircraft's launch as a lineup would project it." })
export class ProjectedLaunchDto implements ProjectedLaunch {
  @IdProperty()
  slotId: number;

  @IdProperty()
  catapultId: number;

  @InstantProperty()
  launchAt: string;

  @ApiProperty()
  missesWindow: boolean;
}

@ApiSchema({ name: 'SuggestedLineup' })
export class SuggestedLineupDto implements SuggestedLineup {
  @IntProperty({ minimum: 0 })
  basisVersion: number;

  @ApiProperty({ type: [SuggestedLaneDto] })
  lanes: SuggestedLaneDto[];

  @ApiProperty({ type: 'integer', isArray: true, description: 'Planned aircraft with no pilot, left out.' })
  unassigned: number[];

  @InstantProperty({ nullable: true })
  lastLaunchAt: string | null;

  @ApiProperty({
    type: [ProjectedLaunchDto],
    description: 'Every aircraft still to launch once the suggestion is applied, in time order.',
  })
  projected: ProjectedLaunchDto[];
}

const SPARE_MATCHES: readonly SpareMatch[] = ['type', 'mission', 'other'];

@ApiSchema({ name: 'SpareCandidate' })
export class SpareCandidateDto implements SpareCandidate {
  @IdProperty()
  slotId: number;

  @ApiProperty()
  sideNumber: string;

  @ApiProperty()
  typeDesignation: string;

  @ApiProperty()
  mission: string;

  @EnumProperty(SPARE_MATCHES, 'SpareMatch', { description: 'Offered in this order: type, then mission, then other.' })
  match: SpareMatch;
}
