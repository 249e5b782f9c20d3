import {
  type AirframeShotCount,
  type CatapultShotCount,
  type CatapultTimeline,
  type CycleReplay,
  type CycleReport,
  type IntervalSpread,
  type LaunchInterval,
  type LaunchRecord,
  type PairTimeline,
  type PlannedBasis,
  type ReportDown,
  type ReportFigures,
  type ReportLaunch,
  type ReportWaiver,
  type ReportSuspend,
  SLOT_STATUSES,
  type ShotCounts,
  type SlotStatus,
  type SquadronReport,
} from '@catline/contracts';
import { ApiProperty, ApiSchema } from '@nestjs/swagger';
import { CycleViewDto } from './cycles.view.js';
import { EnumProperty, IdProperty, InstantProperty, IntProperty } from './fields.js';
import { CATAPULT_POSITIONS } from './fleet.view.js';
import { LaunchRecordDto, LineupChangeDto, LineupSnapshotDto } from './lineup.view.js';

const PLANNED_BASES: PlannedBasis[] = ['cycle_start', 'latest_plan'];

@ApiSchema({ name: 'ReportLaunch', description: 'One aircraft of a timeline: where and when planned, what happened.' })
export class ReportLaunchDto implements ReportLaunch {
  @IdProperty()
  slotId: number;

  @ApiProperty()
  sideNumber: string;

  @ApiProperty()
  typeDesignation: string;

  @IdProperty()
  squadronId: number;

  @ApiProperty()
  squadronCode: string;

  @ApiProperty({ type: String, nullable: true })
  pilotName: string | null;

  @ApiProperty()
  mission: string;

  @IntProperty({ minimum: 1 })
  catapultNumber: number;

  @IntProperty({ nullable: true, minimum: 1 })
  plannedCatapultNumber: number | null;

  @InstantProperty({ nullable: true })
  plannedAt: string | null;

  @InstantProperty({ nullable: true })
  launchedAt: string | null;

  @ApiProperty({ type: Number, nullable: true, description: 'Actual minus planned, seconds.' })
  deltaS: number | null;

  @ApiProperty({ type: Boolean, nullable: true })
  inWindow: boolean | null;

  @EnumProperty(SLOT_STATUSES, 'SlotStatus')
  status: SlotStatus;

  @ApiProperty({ type: String, nullable: true, description: 'The waiver the aircraft launched on.' })
  waiverReason: string | null;

  @ApiProperty({ type: () => LaunchRecordDto, nullable: true, description: 'Null unless launched.' })
  launchRecord: LaunchRecord | null;
}

@ApiSchema({ name: 'LaunchInterval', description: 'The time between two launches that followed each other.' })
export class LaunchIntervalDto implements LaunchInterval {
  @IdProperty()
  fromSlotId: number;

  @ApiProperty()
  fromSideNumber: string;

  @IntProperty({ minimum: 1 })
  fromCatapultNumber: number;

  @IdProperty()
  toSlotId: number;

  @ApiProperty()
  toSideNumber: string;

  @IntProperty({ minimum: 1 })
  toCatapultNumber: number;

  @ApiProperty()
  seconds: number;
}

@ApiSchema({ name: 'IntervalSpread', description: 'Shortest, mean and longest interval, seconds; null when none.' })
export class IntervalSpreadDto implements IntervalSpread {
  @ApiProperty({ type: Number, nullable: true })
  shortestS: number | null;

  @ApiProperty({ type: Number, nullable: true })
  meanS: number | null;

  @ApiProperty({ type: Number, nullable: true })
  longestS: number | null;
}

@ApiSchema({ name: 'CatapultTimeline' })
export class CatapultTimelineDto implements CatapultTimeline {
  @IdProperty()
  catapultId: number;

  @IntProperty({ minimum: 1 })
  number: number;

  @EnumProperty(CATAPULT_POSITIONS, 'CatapultPosition')
  position: CatapultTimeline['position'];

  @IntProperty()
  pair: number;

  @ApiProperty()
  resetIntervalS: number;

  @ApiProperty({ type: [ReportLaunchDto] })
  launches: ReportLaunch[];

  @ApiProperty({ type: [LaunchIntervalDto] })
  intervals: LaunchInterval[];

  @ApiProperty({ type: () => IntervalSpreadDto })
  spread: IntervalSpread;
}

@ApiSchema({ name: 'PairTimeline' })
export class PairTimelineDto implements PairTimeline {
  @IntProperty()
  pair: number;

  @ApiProperty({ type: 'integer', isArray: true })
  catapultNumbers: number[];

  @ApiProperty()
  minimumGapS: number;

  @ApiProperty({ type: [LaunchIntervalDto] })
  intervals: LaunchInterval[];

  @ApiProperty({ type: () => IntervalSpreadDto })
  spread: IntervalSpread;
}

@ApiSchema({ name: 'ReportSuspend' })
export class ReportSuspendDto implements ReportSuspend {
  @IdProperty()
  slotId: number;

  @ApiProperty()
  sideNumber: string;

  @ApiProperty()
  squadronCode: string;

  @IntProperty({ nullable: true, minimum: 1 })
  catapultNumber: number | null;

  @InstantProperty()
  at: string;

  @ApiProperty()
  reason: string;

  @ApiProperty()
  by: string;

  @InstantProperty({ nullable: true })
  resumedAt: string | null;
}

@ApiSchema({ name: 'ReportSpare' })
export class ReportSpareDto {
  @IdProperty()
  slotId: number;

  @ApiProperty()
  sideNumber: string;

  @ApiProperty()
  squadronCode: string;
}

@ApiSchema({ name: 'ReportDown' })
export class ReportDownDto implements ReportDown {
  @IdProperty()
  slotId: number;

  @ApiProperty()
  sideNumber: string;

  @ApiProperty()
  squadronCode: string;

  @IntProperty({ nullable: true, minimum: 1 })
  catapultNumber: number | null;

  @InstantProperty()
  at: string;

  @ApiProperty()
  by: string;

  @ApiProperty({ type: () => ReportSpareDto, nullable: true })
  spare: ReportSpareDto | null;
}

@ApiSchema({ name: 'ReportWaiver' })
export class ReportWaiverDto implements ReportWaiver {
  @IdProperty()
  slotId: number;

  @ApiProperty()
  sideNumber: string;

  @ApiProperty()
  squadronCode: string;

  @IntProperty({ minimum: 1 })
  catapultNumber: number;

  @InstantProperty()
  launchedAt: string;

  @ApiProperty()
  reason: string;

  @ApiProperty({ type: String, nullable: true })
  by: string | null;
}

@ApiSchema({ name: 'ReportFigures', description: "Counts over a set of aircraft (a squadron's or the cycle's)." })
export class ReportFiguresDto implements ReportFigures {
  @IntProperty({ minimum: 0 })
  aircraft: number;

  @IntProperty({ minimum: 0 })
  launched: number;

  @IntProperty({ minimum: 0 })
  onTime: number;

  @IntProperty({ minimum: 0 })
  outsideWindow: number;

  @IntProperty({ minimum: 0 })
  suspends: number;

  @IntProperty({ minimum: 0 })
  down: number;

  @IntProperty({ minimum: 0 })
  waivers: number;

  @IntProperty({ minimum: 0 })
  scratched: number;
}

@ApiSchema({ name: 'SquadronReport' })
export class SquadronReportDto extends ReportFiguresDto implements SquadronReport {
  @IdProperty()
  squadronId: number;

  @ApiProperty()
  squadronCode: string;

  @ApiProperty()
  squadronName: string;
}

@ApiSchema({ name: 'CycleReport', description: 'The record of one cycle: planned against actual, per catapult.' })
export class CycleReportDto implements CycleReport {
  @ApiProperty({ type: () => CycleViewDto })
  cycle: CycleViewDto;

  @EnumProperty(PLANNED_BASES, 'PlannedBasis')
  plannedBasis: PlannedBasis;

  @IntProperty({ minimum: 0 })
  plannedAtVersion: number;

  @InstantProperty({ nullable: true })
  startedAt: string | null;

  @InstantProperty({ nullable: true })
  closedAt: string | null;

  @InstantProperty({ nullable: true })
  firstLaunchAt: string | null;

  @InstantProperty({ nullable: true })
  lastLaunchAt: string | null;

  @ApiProperty({ type: [CatapultTimelineDto] })
  catapults: CatapultTimeline[];

  @ApiProperty({ type: [PairTimelineDto] })
  pairs: PairTimeline[];

  @ApiProperty({ type: [ReportSuspendDto] })
  suspends: ReportSuspend[];

  @ApiProperty({ type: [ReportDownDto] })
  downs: ReportDown[];

  @ApiProperty({ type: [ReportWaiverDto] })
  waivers: ReportWaiver[];

  @ApiProperty({ type: () => ReportFiguresDto })
  totals: ReportFigures;

  @ApiProperty({ type: [SquadronReportDto] })
  squadrons: SquadronReport[];
}

@ApiSchema({ name: 'CycleReplay', description: 'The lineup at version 0 and every change after it, in order.' })
export class CycleReplayDto implements CycleReplay {
  @ApiProperty({ type: () => LineupSnapshotDto })
  start: LineupSnapshotDto;

  @ApiProperty({ type: [LineupChangeDto] })
  changes: LineupChangeDto[];
}

@ApiSchema({ name: 'AirframeShotCount' })
export class AirframeShotCountDto implements AirframeShotCount {
  @IdProperty()
  aircraftId: number;

  @ApiProperty()
  sideNumber: string;

  @ApiProperty()
  typeDesignation: string;

  @ApiProperty()
  squadronCode: string;

  @IntProperty({ minimum: 0 })
  launches: number;

  @IntProperty({ minimum: 0 })
  lifetimeShots: number;
}

@ApiSchema({ name: 'CatapultShotCount' })
export class CatapultShotCountDto implements CatapultShotCount {
  @IdProperty()
  catapultId: number;

  @ApiProperty()
  shipName: string;

  @IntProperty({ minimum: 1 })
  number: number;

  @IntProperty({ minimum: 0 })
  launches: number;

  @IntProperty({ minimum: 0 })
  lifetimeShots: number;
}

@ApiSchema({ name: 'ShotCounts', description: 'Launches per airframe and catapult over UTC calendar days.' })
export class ShotCountsDto implements ShotCounts {
  @ApiProperty({ format: 'date', description: 'YYYY-MM-DD.' })
  from: string;

  @ApiProperty({ format: 'date', description: 'YYYY-MM-DD.' })
  to: string;

  @IntProperty({ minimum: 0 })
  totalLaunches: number;

  @ApiProperty({ type: [AirframeShotCountDto] })
  airframes: AirframeShotCount[];

  @ApiProperty({ type: [CatapultShotCountDto] })
  catapults: CatapultShotCount[];
}
