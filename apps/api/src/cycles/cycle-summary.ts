import {
  LAUNCH_CAUTION,
  shipClock,
  shipDateTime,
  shipTime,
  type SlotStatus,
  type WeatherCase,
} from '@catline/contracts';

// The summary a squadron receives when a cycle closes: its own aircraft line by line, the cycle's
// totals, and what happened to its aircraft on the way (down, suspended, launched under a waiver).

export interface SummarySlot {
  id: number;
  sideNumber: string;
  typeDesignation: string;
  squadronId: number;
  mission: string;
  pilotName: string | null;
  status: SlotStatus;
  /** The catapult it launched from; null unless launched. */
  catapultNumber: number | null;
  launchedAt: Date | null;
  /** The side number of the spare that took a down aircraft's place. */
  replacedBy: string | null;
}

export interface SummaryEvent {
  at: Date;
  slotId: number;
  summary: string;
}

export interface SummarySquadron {
  id: number;
  name: string;
  code: string;
  email: string;
}

export interface CycleSummaryInput {
  shipName: string;
  hullCode: string;
  cycleNumber: number;
  /** The ship's zone (IANA name): every time of the summary is told in it, named. */
  timeZone: string;
  plannedLaunchAt: Date;
  windowStartAt: Date;
  windowEndAt: Date;
  weatherCase: WeatherCase;
  night: boolean;
  slots: SummarySlot[];
  events: SummaryEvent[];
}

export interface ComposedMail {
  subject: string;
  text: string;
}

function outcome(slot: SummarySlot, timeZone: string): string {
  switch (slot.status) {
    case 'launched':
      return `launched ${slot.launchedAt ? shipClock(slot.launchedAt, timeZone) : '(time not recorded)'} from cat ${slot.catapultNumber ?? '?'}`;
    case 'down':
      return slot.replacedBy ? `down, replaced by ${slot.replacedBy}` : 'down';
    default:
      return 'not launched (scratched when the cycle closed)';
  }
}

const launchedOf = (slots: SummarySlot[]) => slots.filter((slot) => slot.status === 'launched');

function cycleTotals(input: CycleSummaryInput): string {
  const launched = launchedOf(input.slots);
  const times = launched.flatMap((slot) => (slot.launchedAt ? [slot.launchedAt.getTime()] : [])).sort((a, b) => a - b);
  const span =
    times.length > 0
      ? `, first at ${shipClock(new Date(times[0]), input.timeZone)}, last at ${shipClock(new Date(times[times.length - 1]), input.timeZone)}`
      : '';
  return `Whole cycle: ${launched.length} of ${input.slots.length} aircraft launched${span}.`;
}

/** The summary of a closed cycle for one squadron, which must have aircraft in it. */
export function composeCycleSummary(input: CycleSummaryInput, squadron: SummarySquadron): ComposedMail {
  const own = input.slots.filter((slot) => slot.squadronId === squadron.id);
  const ownIds = new Set(own.map((slot) => slot.id));
  const events = input.events.filter((event) => ownIds.has(event.slotId));
  const width = (pick: (slot: SummarySlot) => string) => Math.max(...own.map((slot) => pick(slot).length));
  const columns: ((slot: SummarySlot) => string)[] = [
    (slot) => slot.sideNumber,
    (slot) => slot.typeDesignation,
    (slot) => slot.mission,
    (slot) => slot.pilotName ?? 'no pilot named',
  ];
  const widths = columns.map(width);
  const line = (slot: SummarySlot) =>
    `  ${columns.map((pick, i) => pick(slot).padEnd(widths[i])).join('  ')}  ${outcome(slot, input.timeZone)}`;

  const lines = [
    `Cycle ${input.cycleNumber} of ${input.shipName} (${input.hullCode}) is closed.`,
    `Planned launch ${shipDateTime(input.plannedLaunchAt, input.timeZone)} (window ${shipTime(input.windowStartAt, input.timeZone)} to ${shipTime(input.windowEndAt, input.timeZone)}), case ${input.weatherCase}, ${input.night ? 'night' : 'day'}.`,
    cycleTotals(input),
    '',
    `${squadron.name} (${squadron.code}): ${launchedOf(own).length} of ${own.length} launched`,
    ...own.map(line),
  ];
  if (events.length > 0) {
    lines.push(
      '',
      'What happened to these aircraft:',
      ...events.map((event) => `  ${shipClock(event.at, input.timeZone)}  ${event.summary}`),
    );
  }
  lines.push('', `Sent by Catline when the cycle closed. ${LAUNCH_CAUTION}`);
  return {
    subject: `Cycle ${input.cycleNumber} closed: ${squadron.name} ${launchedOf(own).length} of ${own.length} launched`,
    text: `${lines.join('\n')}\n`,
  };
}
