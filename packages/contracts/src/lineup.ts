import type { AircraftClass, CatapultPosition, CatapultStatus } from './fleet.js';
import type { CycleView } from './cycles.js';
import type { DeckPositionView } from './deck.js';
import type { Role } from './roles.js';

export const SLOT_STATUSES = [
  'planned',
  'taxiing',
  'on_catapult',
  'weight_agreed',
  'setting_set',
  'deflector_up',
  'tensioned',
  'run_up',
  'checks_clear',
  'pilot_ready',
  'launched',
  'suspended',
  'down',
  'scratched',
] as const;
export type SlotStatus = (typeof SLOT_STATUSES)[number];

/** Past planned and not yet launched, at any readiness step: the aircraft that can leave the catapult for the deck pool. */
export const RETURNABLE_STATUSES: readonly SlotStatus[] = [
  'taxiing',
  'on_catapult',
  'weight_agreed',
  'setting_set',
  'deflector_up',
  'tensioned',
  'run_up',
  'checks_clear',
  'pilot_ready',
  'suspended',
];

/** What changed under an aircraft's agreed figures (launch-math's REVERIFY_CAUSES). */
export const REVERIFY_CAUSES = ['wind', 'ship_speed', 'weight', 'launch_data'] as const;
export type ReverifyCause = (typeof REVERIFY_CAUSES)[number];

export type CrosswindSide = 'port' | 'starboard' | 'none';

export const NO_GO_CODES = [
  'margin_negative',
  'crosswind_over_limit',
  'over_max_gross_weight',
  'catapult_down',
  'catapult_closed',
  'outside_launch_table',
  'approved_setting_missing',
  'setting_out_of_range',
] as const;
export type NoGoCode = (typeof NO_GO_CODES)[number];

export interface NoGoReason {
  code: NoGoCode;
  /** A sentence for the deck crew, with the figures that caused it. */
  message: string;
}

/** What must hold before a catapult fires (launch-math's LAUNCH_GATES): hard ones first, then soft. */
export const LAUNCH_GATE_CODES = [
  'cycle_not_executing',
  'catapult_down',
  'catapult_closed',
  'deck_not_clear',
  'weight_not_agreed',
  'reverify_required',
  'over_max_gross_weight',
  'crosswind_over_limit',
  'outside_launch_table',
  'approved_setting_missing',
  'end_speed_below_minimum',
  'end_speed_over_max',
  'excess_below_recommended',
  'wind_reading_stale',
] as const;
export type LaunchGateCode = (typeof LAUNCH_GATE_CODES)[number];

/** The gates the air boss may waive with a reason; every other gate refuses with no override. */
export const SOFT_LAUNCH_GATE_CODES = ['excess_below_recommended', 'wind_reading_stale'] as const;
export type SoftLaunchGateCode = (typeof SOFT_LAUNCH_GATE_CODES)[number];

/** A soft gate the air boss waived for one aircraft, kept on its record. */
export interface WaiverView {
  gate: SoftLaunchGateCode;
  reason: string;
  by: string;
  at: string;
}

/** A launch gate that is closed for an aircraft: hard ones refuse the shot; soft ones until waived. */
export interface LaunchGateView {
  gate: LaunchGateCode;
  soft: boolean;
  waived: boolean;
  /** A sentence for the deck crew, with the figures that close it. */
  message: string;
}

export interface WindOverDeck {
  headwindKt: number;
  crosswindKt: number;
  crosswindSide: CrosswindSide;
}

/** The figures of one aircraft on one catapult under the cycle's conditions. */
export interface LaunchFigures extends WindOverDeck {
  /**
   * The setting from the ship's approved launch data for the catapult, type and configuration; null
   * when the data gives none (no table, or the weight above its last row: the launch is refused).
   */
  catapultSetting: number | null;
  /** Catline's energy model's setting for the end speed wanted, the cross-check; null when none reaches it. */
  crossCheckSetting: number | null;
  /**
   * True when the cross-check differs from the approved setting by more than the ship's tolerance, or
   * reaches no setting; null where not judged (no approved setting, or a recorded shot).
   */
  crossCheckFlagged: boolean | null;
  /** At the setting given, or at the highest setting when none reaches the wanted end speed. */
  endSpeedKt: number;
  /**
   * Minimum launch airspeed (density-corrected) plus the required excess, knots. This and the two
   * figures below are null when the gross weight is outside the type's launch table.
   */
  requiredAirspeedKt: number | null;
  requiredWindOverDeckKt: number | null;
  marginKt: number | null;
  /** Headwind less (minimum launch airspeed - end speed); null outside the launch table or not recorded. */
  excessWindOverDeckKt: number | null;
  /** The approved data's recommended excess wind over deck, to show beside the excess; null where not recorded. */
  recommendedExcessKt: number | null;
  go: boolean;
  reasons: NoGoReason[];
  /** Degrees; positive to starboard, 0 for none (night). */
  clearingTurnDeg: number;
}

/**
 * `shot`: written by the launch command itself. `rebuilt`: put together afterwards by a migration
 * from the change log of a launch recorded before the record existed; a figure the log did not keep
 * is null.
 */
export const LAUNCH_RECORD_SOURCES = ['shot', 'rebuilt'] as const;
export type LaunchRecordSource = (typeof LAUNCH_RECORD_SOURCES)[number];

/** The wind over the deck as it was read when the aircraft was fired. */
export interface WindReadingUsed {
  /** When the reading was taken; null when the cycle's conditions held no time of reading. */
  readAt: string | null;
  shipCourseDeg: number;
  shipSpeedKt: number;
  /** Direction the true wind blew from, degrees true. */
  trueWindFromDeg: number;
  trueWindSpeedKt: number;
  /**
   * The gust and the lull of the reading as true winds (the lull is what the headwind rests on); null in a
   * record frozen or rebuilt before the cycle kept a spread.
   */
  windGustFromDeg: number | null;
  windGustKt: number | null;
  windLullFromDeg: number | null;
  windLullKt: number | null;
  /** The steady wind across the deck: off the bow, degrees, negative to port; and its speed, knots. */
  relativeWindBearingDeg: number;
  relativeWindSpeedKt: number;
  temperatureC: number;
  pressureHpa: number;
}

/** Who gave the launch command. */
export interface LaunchFiredBy {
  /** Null when only the name was kept (a rebuilt record of a person since removed). */
  id: number | null;
  name: string;
  role: Role | null;
}

/**
 * What was used with the shot, frozen at the launch command: reports, replay, exports and shot counts
 * read these figures and never compute them again from the conditions of today.
 */
export interface LaunchRecord {
  source: LaunchRecordSource;
  launchedAt: string;
  catapultId: number;
  catapultNumber: number;
  /** The gross weight the pilot and the catapult officer agreed, pounds. */
  grossWeightLb: number;
  fuelLb: number;
  stores: string;
  /** The setting the ship's approved launch data gives; null when the launch data gives no setting. */
  launchDataSetting: number | null;
  /** Catline's estimate from the catapult's energy model, the cross-check of the setting. */
  crossCheckSetting: number | null;
  windReading: WindReadingUsed | null;
  /** Along and across the catapult, knots; null when a rebuilt record had no figures. */
  headwindKt: number | null;
  crosswindKt: number | null;
  crosswindSide: CrosswindSide | null;
  endSpeedKt: number | null;
  /** Minimum launch airspeed (density-corrected) plus the required excess, knots. */
  requiredAirspeedKt: number | null;
  requiredWindOverDeckKt: number | null;
  /** Headwind along the catapult minus the wind over deck required (the launch margin), knots. */
  excessWindKt: number | null;
  /**
   * The excess wind over deck the station showed and the type's recommended excess beside it, knots;
   * null in a record kept before they were, or rebuilt without figures.
   */
  excessWindOverDeckKt: number | null;
  recommendedExcessKt: number | null;
  /** The figures' verdict at the shot and why it was no-go, if it was. */
  go: boolean | null;
  reasons: NoGoReason[];
  trimDeg: number | null;
  afterburnerRequired: boolean | null;
  /** Degrees, positive to starboard, 0 for none. */
  clearingTurnDeg: number | null;
  /** The reason given to launch on a no-go figure (the air boss's waiver or the officer's override). */
  waiver: string | null;
  firedBy: LaunchFiredBy | null;
}

/** A stores line of a slot: an item of its type's catalogue, its weight each when loaded, and how many. */
export interface SlotStoresLine {
  name: string;
  /** Whole pounds. */
  weightEachLb: number;
  /** One or more. */
  count: number;
}

/** How a slot's planned gross weight was built (launch-math's grossWeightBuildUp), all in lb. */
export interface GrossWeightPartsView {
  /** The type's operating weight with crew when the load was set. */
  operatingWeightLb: number;
  fuelLb: number;
  stores: (SlotStoresLine & { weightLb: number })[];
  storesWeightLb: number;
  grossWeightLb: number;
}

/** launch-math's TimingVerdict. */
export const TIMING_VERDICTS = ['early', 'on_time', 'late'] as const;
export type TimingVerdict = (typeof TIMING_VERDICTS)[number];

/** How a launch time runs against a reference, in whole minutes (0 when on time). */
export interface TimingAgainstView {
  verdict: TimingVerdict;
  minutes: number;
}

/**
 * An aircraft's launch time against its window's end (late by the minutes started after it, else on time
 * with the whole minutes to spare) and, once launching, against the plan: the lineup as projected from the
 * planned start with nothing yet launched.
 */
export interface LaunchTimingView {
  window: TimingAgainstView;
  plan: TimingAgainstView | null;
}

export interface SlotView {
  id: number;
  cycleId: number;
  aircraftId: number;
  sideNumber: string;
  typeId: number;
  typeDesignation: string;
  /** The type's class: which of the ship's departures the aircraft flies. */
  aircraftClass: AircraftClass;
  squadronId: number;
  squadronCode: string;
  pilotId: number | null;
  pilotName: string | null;
  mission: string;
  fuelLb: number;
  /** The stores in words: the list below as one line, or as typed in the air plan. */
  stores: string;
  /** The stores list as loaded; empty while the planned weight is the one typed in the air plan. */
  storesList: SlotStoresLine[];
  /** The planned gross weight, lb: built from its parts once fuel and stores are set, typed in before. */
  grossWeightLb: number;
  /** The parts of the planned gross weight; null while it is the figure typed in the air plan. */
  grossWeightParts: GrossWeightPartsView | null;
  /** Armed or safe as the deck crew last recorded it; null until first recorded. */
  armState: ArmState | null;
  /** When and by whom armed or safe was last recorded. */
  armStateAt: string | null;
  armStateBy: string | null;
  tanker: boolean;
  earlyWarning: boolean;
  spare: boolean;
  /**
   * A spare not yet called: held aside, in no catapult's order and not counted in the cycle's
   * aircraft until the handler calls it for a down aircraft.
   */
  heldSpare: boolean;
  /** Null while the slot is in the deck pool. */
  catapultId: number | null;
  /** The catapult whose order a down aircraft left; null while it is not down, or went down from the deck pool. */
  downFromCatapultId: number | null;
  /** 0-based place in its lane; null in the deck pool. */
  position: number | null;
  status: SlotStatus;
  /** Bumped by every change to this slot; the basis of commands on it. */
  version: number;
  trimDeg: number | null;
  afterburnerRequired: boolean;
  /** The ship profile's departure for the cycle's weather case and the aircraft's class. */
  departure: string;
  pilotWeightAckAt: string | null;
  /** The figure the pilot answered from the tablet; null when not answered there. */
  pilotWeightAckLb: number | null;
  /** The gross weight the crew recorded as agreed; the setting is worked out from it. */
  agreedWeightLb: number | null;
  catapultWeightAckAt: string | null;
  /** Who recorded the agreed weight, and so gave the setting to set; null while none is agreed. */
  weightAgreedBy: string | null;
  /** The setting read back from the console; null until read back, and again after a drop-back before it. */
  settingReadBack: SettingReadBackView | null;
  /** The holdback release element the aircraft's type is launched with; null while not recorded. */
  holdbackElement: string | null;
  suspendReason: string | null;
  overrideReason: string | null;
  /** What changed under the agreed figures since they were verified; null when nothing waits for a read-back. */
  reverifyCause: ReverifyCause | null;
  launchedAt: string | null;
  /** When and by whom the status last changed. */
  statusAt: string | null;
  statusBy: string | null;
  projectedLaunchAt: string | null;
  missesWindow: boolean;
  /** How the projected (or actual) launch runs against the window and the plan; null without a time. */
  timing: LaunchTimingView | null;
  /** Null in the deck pool; for a launched aircraft, the figures its launch record froze. */
  figures: LaunchFigures | null;
  /** What was used with the shot; null until launched. */
  launchRecord: LaunchRecord | null;
  /** Soft gates the air boss waived for this aircraft; cleared when its figures change. */
  waivers: WaiverView[];
  /** The launch gates closed for it on its catapult now, in order; null in the deck pool. */
  gates: LaunchGateView[] | null;
  /** Where the aircraft is now in this cycle; null once it has launched. */
  deckPosition: DeckPositionView | null;
  /** Side numbers of the aircraft parked in front that must move before this one can taxi out to launch. */
  mustMove: string[];
}

/** The two-person check of the setting: the figure on the console, equal to the approved one. */
export interface SettingReadBackView {
  setting: number;
  /** The agreed weight the setting is for, lb. */
  weightLb: number;
  /** Who recorded the agreed weight the setting was set for. */
  setBy: string;
  /** Who read the setting back from the console; may be the same person on a one-officer catapult. */
  readBackBy: string;
  at: string;
}

export interface LaneView extends WindOverDeck {
  catapultId: number;
  number: number;
  position: CatapultPosition;
  status: CatapultStatus;
  /** Waist catapults are closed while the landing area is in use. */
  closed: boolean;
  /** The air boss's deck status for this catapult: clear to launch, or not clear for `deckHoldReason`. */
  deckClear: boolean;
  deckHoldReason: string | null;
  /** The lane's slots in launch order. */
  slotIds: number[];
  /** The readiness steps this catapult runs, in order: its own list, or the ship's. */
  readinessSteps: ReadinessStep[];
  /** True when every slot still to launch in the lane is go. */
  go: boolean;
}

export interface LineupSnapshot {
  cycle: CycleView;
  /** The ship's readiness steps, in order; a catapult with a list of its own has it on its lane. */
  readinessSteps: ReadinessStep[];
  lanes: LaneView[];
  /** Slots in the deck pool, by side number. */
  pool: number[];
  slots: SlotView[];
  lastLaunchAt: string | null;
  version: number;
}

export const CHANGE_KINDS = [
  'slot_moved',
  'suggestion_applied',
  'aircraft_down',
  'catapult_status_set',
  'slot_advanced',
  'slot_suspended',
  'slot_launched',
  'weight_acknowledged',
  'conditions_changed',
  'cycle_started',
  'cycle_stopped',
  'cycle_closed',
  'air_plan_imported',
  'slot_added',
  'gate_waived',
  'aircraft_towed',
  'landing_area_set',
  'deck_status_set',
  'launch_prerequisite_set',
  'respot_built',
  'respot_tow_done',
  'spare_called',
  'pilot_assigned',
  'aircraft_up',
  'slot_returned',
  'hangfire',
  'cold_shot_suspected',
  'down_on_catapult',
  'suspend_reason_given',
  'load_set',
  'arm_state_set',
  'launch_data_changed',
  /** The ship's profile or a catapult's readiness steps changed: the lanes carry the lists they run now. */
  'readiness_steps_changed',
] as const;
export type ChangeKind = (typeof CHANGE_KINDS)[number];

/**
 * The only changes a closed cycle takes: building the respot and ticking off its tows. A cycle closes
 * itself at its last launch, and the respot is for the recovery after that launch, so it always lands
 * on a closed cycle; every other change to a closed cycle is refused (cycle_closed).
 */
export const CLOSED_CYCLE_CHANGE_KINDS = ['respot_built', 'respot_tow_done'] as const satisfies readonly ChangeKind[];

/** Whether a closed cycle takes a change of this kind (see CLOSED_CYCLE_CHANGE_KINDS). */
export const closedCycleTakes = (kind: ChangeKind): boolean =>
  (CLOSED_CYCLE_CHANGE_KINDS as readonly ChangeKind[]).includes(kind);

/**
 * The changes that alter what a list of cycles shows (state, conditions, aircraft and launches counted):
 * the server also sends their cycle to every socket of the ship ('cycle:status'). A launch is one, since
 * the last launch closes its cycle.
 */
export const CYCLE_LIST_CHANGE_KINDS = [
  'cycle_started',
  'cycle_stopped',
  'cycle_closed',
  'conditions_changed',
  'launch_prerequisite_set',
  'slot_added',
  'air_plan_imported',
  'slot_launched',
] as const satisfies readonly ChangeKind[];

/** Whether a change of this kind alters what a list of cycles shows (see CYCLE_LIST_CHANGE_KINDS). */
export const changesCycleList = (kind: ChangeKind): boolean =>
  (CYCLE_LIST_CHANGE_KINDS as readonly ChangeKind[]).includes(kind);

/** What changed: replace these parts of the snapshot, by id. */
export interface LineupPatch {
  cycle?: CycleView;
  lanes?: LaneView[];
  pool?: number[];
  slots?: SlotView[];
  lastLaunchAt?: string | null;
}

export interface ChangeActor {
  id: number;
  name: string;
  role: Role;
}

/** One accepted change, as kept in the change log and broadcast to the cycle's room. */
export interface LineupChange {
  cycleId: number;
  version: number;
  kind: ChangeKind;
  actor: ChangeActor;
  at: string;
  /** A one-line account for people, e.g. "D33 moved to cat 2, place 3". */
  summary: string;
  patch: LineupPatch;
}

export interface LineupCommandResult {
  version: number;
  change: LineupChange;
}

/** Move a slot into a lane at an index, or back to the deck pool (`toCatapultId: null`). */
export interface MoveSlotRequest {
  slotId: number;
  slotVersion: number;
  toCatapultId: number | null;
  toIndex: number;
  /** The target lane's slot ids as the sender saw them before the move. */
  targetLaneOrder: number[];
}

/** One aircraft's launch as a lineup would project it. */
export interface ProjectedLaunch {
  slotId: number;
  catapultId: number;
  launchAt: string;
  missesWindow: boolean;
}

export interface SuggestedLineup {
  basisVersion: number;
  lanes: { catapultId: number; slotIds: number[] }[];
  /** Planned aircraft with no pilot, left out of the suggestion until one is assigned. */
  unassigned: number[];
  lastLaunchAt: string | null;
  /** Every aircraft still to launch, as the lineup would stand once the suggestion is applied, in time order. */
  projected: ProjectedLaunch[];
}

export interface ApplySuggestionRequest {
  basisVersion: number;
  lanes: { catapultId: number; slotIds: number[] }[];
}

export interface MarkDownRequest {
  slotVersion: number;
  /** A spare slot of the same cycle that takes the down aircraft's place. */
  spareSlotId?: number;
}

export interface SetCatapultStatusRequest {
  status: CatapultStatus;
  /** The status the sender saw. */
  basisStatus: CatapultStatus;
  reason?: string;
  /**
   * Mark it down although an aircraft is on it or tensioned (asked again after the `aircraft_on_catapult`
   * refusal): the aircraft is then suspended.
   */
  confirm?: boolean;
}

/**
 * Every readiness step in the trade's order (launch-math's READINESS_STEP_CATALOGUE); a ship runs these
 * or a subset of them in this order (its profile's `readinessSteps`). `resume` returns a suspended slot
 * to on_catapult.
 */
export const READINESS_STEPS = [
  'taxiing',
  'on_catapult',
  'weight_agreed',
  'setting_set',
  'deflector_up',
  'tensioned',
  'run_up',
  'checks_clear',
  'pilot_ready',
] as const;
export type ReadinessStep = (typeof READINESS_STEPS)[number];

export interface AdvanceSlotRequest {
  slotVersion: number;
  to: ReadinessStep | 'resume';
  /** With `weight_agreed`: the gross weight the crew records as agreed with the pilot, lb. */
  agreedWeightLb?: number;
  /**
   * With `setting_set`: the setting the crew read on the catapult's console; refused unless it is the
   * approved setting for the agreed weight.
   */
  settingReadBack?: number;
}

/** The person who took the last step takes it back, within 10 s. */
export interface UndoStepRequest {
  slotVersion: number;
}

export interface SuspendSlotRequest {
  slotVersion: number;
  /** Left out: one tap suspends, and the reason is chosen afterwards. */
  reason?: string;
}

/** The catapult fired and the aircraft did not go (hangfire), or went on a shot the crew suspect was cold. */
export interface CatapultEventRequest {
  slotVersion: number;
}

/** What becomes of an aircraft that went unserviceable on the catapult. */
export const DOWN_ON_CATAPULT_OUTCOMES = ['pool', 'down'] as const;
export type DownOnCatapultOutcome = (typeof DOWN_ON_CATAPULT_OUTCOMES)[number];

/** The aircraft on the catapult went unserviceable: back to the deck pool, or down. */
export interface DownOnCatapultRequest {
  slotVersion: number;
  outcome: DownOnCatapultOutcome;
}

/** The quick choices for why an aircraft was suspended, picked after the one tap that suspended it. */
export const SUSPEND_REASONS = ['launch_bar', 'holdback', 'aircraft_fault', 'pilot', 'deck', 'other'] as const;
export type SuspendReason = (typeof SUSPEND_REASONS)[number];

/** Each quick choice in the deck crew's words, as kept in the record. */
export const SUSPEND_REASON_LABELS: Record<SuspendReason, string> = {
  launch_bar: 'Launch bar',
  holdback: 'Holdback',
  aircraft_fault: 'Aircraft fault',
  pilot: 'Pilot',
  deck: 'Deck',
  other: 'Other',
};

export interface SuspendReasonRequest {
  slotVersion: number;
  reason: SuspendReason;
  /** Required with `other`: the reason in a few words. */
  text?: string;
}

export interface LaunchSlotRequest {
  slotVersion: number;
  /** Chosen by the client once per launch intent; a repeat with the same key is answered, not applied. */
  idempotencyKey: string;
}

/** The air boss waives a soft launch gate for one aircraft. */
export interface WaiveGateRequest {
  slotVersion: number;
  gate: SoftLaunchGateCode;
  reason: string;
}

export interface WeightAckRequest {
  slotVersion: number;
  grossWeightLb: number;
}

/** How a spare matches the down aircraft it would replace; spares are offered in this order. */
export type SpareMatch = 'type' | 'mission' | 'other';

export interface SpareCandidate {
  slotId: number;
  sideNumber: string;
  typeDesignation: string;
  mission: string;
  match: SpareMatch;
}

/** Call a held spare for a down aircraft: it joins the cycle and the down aircraft's pilot moves to it. */
export interface CallSpareRequest {
  /** The down slot's version as the sender saw it. */
  slotVersion: number;
  spareSlotId: number;
  spareVersion: number;
}

/** Assign a pilot to an aircraft, or take the pilot off it (`pilotId: null`); a pilot flying another aircraft moves. */
/** Fuel on board and the stores list of a slot, each stores item named from its type's catalogue. */
/** Whether an aircraft's weapons are armed or made safe, as the deck crew records it. */
export const ARM_STATES = ['safe', 'armed'] as const;
export type ArmState = (typeof ARM_STATES)[number];

/** The words of the command that records each state, the same at the Cat station and on the handler's lineup. */
export const ARM_STATE_ACTION_LABELS: Record<ArmState, string> = { safe: 'Record safe', armed: 'Record armed' };

/** Record an aircraft armed or safe: the handler, or the catapult officer or deck edge operator of its catapult. */
export interface SetArmStateRequest {
  slotVersion: number;
  armState: ArmState;
}

export interface SetLoadRequest {
  slotVersion: number;
  /** Whole pounds. */
  fuelLb: number;
  stores: { name: string; count: number }[];
}

export interface AssignPilotRequest {
  slotVersion: number;
  pilotId: number | null;
}

/** A down aircraft is serviceable again and goes back to the deck pool. */
export interface UpAgainRequest {
  slotVersion: number;
  reason: string;
}

/** A taxiing or on-catapult aircraft goes back to the deck pool instead of being scrapped. */
export interface ReturnToPoolRequest {
  slotVersion: number;
  reason: string;
  /** Required from the handler: the catapult officer of the aircraft's catapult agreed. */
  catapultOfficerAgreed?: boolean;
}
