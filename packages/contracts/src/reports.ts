import type { CycleView } from './cycles.js';
import type { CatapultPosition } from './fleet.js';
import type { LaunchRecord, LineupChange, LineupSnapshot, SlotStatus } from './lineup.js';

/**
 * Which lineup a report's planned times come from: the lineup as it stood when the cycle started
 * executing (rebuilt from the change log), or, for a cycle that never started, its latest plan.
 */
export type PlannedBasis = 'cycle_start' | 'latest_plan';

/** One aircraft of a cycle's timeline: where and when it was planned to launch, and what happened. */
export interface ReportLaunch {
  slotId: number;
  sideNumber: string;
  typeDesignation: string;
  squadronId: number;
  squadronCode: string;
  pilotName: string | null;
  mission: string;
  /** The catapult it launched from; for an aircraft that did not launch, the one it was planned on. */
  catapultNumber: number;
  /** The catapult it was planned on at the basis; null when it was not in a lane then. */
  plannedCatapultNumber: number | null;
  /** ISO 8601 instants; null when none. */
  plannedAt: string | null;
  launchedAt: string | null;
  /** Actual minus planned, seconds (positive: late against the plan); null unless both are known. */
  deltaS: number | null;
  /** Launched inside the cycle's launch window; null unless launched. */
  inWindow: boolean | null;
  status: SlotStatus;
  /** The air boss's waiver the aircraft launched on (the soft gate and the reason); null without one. */
  waiverReason: string | null;
  /** The figures used with the shot as frozen at the launch command; null unless launched. */
  launchRecord: LaunchRecord | null;
}

/** The time between two launches that followed each other. */
export interface LaunchInterval {
  fromSlotId: number;
  fromSideNumber: string;
  fromCatapultNumber: number;
  toSlotId: number;
  toSideNumber: string;
  toCatapultNumber: number;
  seconds: number;
}

/** Shortest, mean and longest of a set of intervals, seconds; null when there is none. */
export interface IntervalSpread {
  shortestS: number | null;
  meanS: number | null;
  longestS: number | null;
}

export interface CatapultTimeline {
  catapultId: number;
  number: number;
  position: CatapultPosition;
  pair: number;
  /** The catapult's configured reset interval, for comparison with the intervals flown. */
  resetIntervalS: number;
  /** Launched aircraft by launch time, then the ones planned here that did not launch. */
  launches: ReportLaunch[];
  /** Between consecutive launches from this catapult. */
  intervals: LaunchInterval[];
  spread: IntervalSpread;
}

export interface PairTimeline {
  pair: number;
  catapultNumbers: number[];
  /** The ship's minimum gap between launches of a pair's catapults, for comparison. */
  minimumGapS: number;
  /** Between consecutive launches from any catapult of the pair, in launch order. */
  intervals: LaunchInterval[];
  spread: IntervalSpread;
}

export interface ReportSuspend {
  slotId: number;
  sideNumber: string;
  squadronCode: string;
  catapultNumber: number | null;
  at: string;
  reason: string;
  /** Who suspended it (the catapult officer), as the change log keeps the name. */
  by: string;
  /** When it went back on the catapult; null if it never did. */
  resumedAt: string | null;
}

export interface ReportDown {
  slotId: number;
  sideNumber: string;
  squadronCode: string;
  /** The catapult it was in line for; null when it went down in the deck pool. */
  catapultNumber: number | null;
  at: string;
  by: string;
  /** The spare that took its place, if one did. */
  spare: { slotId: number; sideNumber: string; squadronCode: string } | null;
}

/** A launch on a waiver of a soft gate. */
export interface ReportWaiver {
  slotId: number;
  sideNumber: string;
  squadronCode: string;
  catapultNumber: number;
  launchedAt: string;
  reason: string;
  by: string | null;
}

/** Counts over a set of aircraft (a squadron's or the whole cycle's). */
export interface ReportFigures {
  aircraft: number;
  launched: number;
  /** Launched inside the cycle's window. */
  onTime: number;
  /** Launched outside the cycle's window. */
  outsideWindow: number;
  /** Suspend events (an aircraft suspended twice counts twice). */
  suspends: number;
  down: number;
  /** Launched on a waiver. */
  waivers: number;
  /** Not launched when the cycle closed. */
  scratched: number;
}

export interface SquadronReport extends ReportFigures {
  squadronId: number;
  squadronCode: string;
  squadronName: string;
}

/** The record of one cycle: planned against actual per catapult, intervals, suspends, down aircraft, waivers. */
export interface CycleReport {
  cycle: CycleView;
  plannedBasis: PlannedBasis;
  /** The change-log version the planned times were read at. */
  plannedAtVersion: number;
  startedAt: string | null;
  closedAt: string | null;
  firstLaunchAt: string | null;
  lastLaunchAt: string | null;
  catapults: CatapultTimeline[];
  pairs: PairTimeline[];
  suspends: ReportSuspend[];
  downs: ReportDown[];
  waivers: ReportWaiver[];
  totals: ReportFigures;
  squadrons: SquadronReport[];
}

/**
 * Everything needed to step through a cycle's history: the lineup at version 0 (created, no aircraft)
 * and every change after it, in version order. Apply them with `applyLineupPatch`.
 */
export interface CycleReplay {
  start: LineupSnapshot;
  changes: LineupChange[];
}

/** Shot counts are asked for by UTC calendar days, both ends included. */
export interface ShotCountsQuery {
  /** YYYY-MM-DD. */
  from: string;
  /** YYYY-MM-DD. */
  to: string;
}

export interface AirframeShotCount {
  aircraftId: number;
  sideNumber: string;
  typeDesignation: string;
  squadronCode: string;
  /** Launches in the range. */
  launches: number;
  /** Every catapult shot on record for the airframe. */
  lifetimeShots: number;
}

export interface CatapultShotCount {
  catapultId: number;
  shipName: string;
  number: number;
  launches: number;
  lifetimeShots: number;
}

export interface ShotCounts extends ShotCountsQuery {
  totalLaunches: number;
  /** Every airframe of the fleet, by side number. */
  airframes: AirframeShotCount[];
  /** Every catapult, by ship and number. */
  catapults: CatapultShotCount[];
}
