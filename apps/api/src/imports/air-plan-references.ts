import type { AirPlanRow, ImportProblem, Role } from '@catline/contracts';
import type { AirPlanLine } from './air-plan-layout.js';

/** What the check needs to know of an aircraft named in the plan. */
export interface PlanAircraft {
  id: number;
  sideNumber: string;
  serviceable: boolean;
  typeDesignation: string;
  maxGrossWeightLb: number;
  squadronCode: string;
}

export interface PlanPerson {
  id: number;
  name: string;
  email: string;
  role: Role;
  active: boolean;
}

/** The cycle as it stands: its number, the aircraft in it and who flies what there. */
export interface PlanCycle {
  number: number;
  aircraftIds: ReadonlySet<number>;
  /** Pilot id to the side number they fly in the cycle (slots neither down nor scratched). */
  pilotsFlying: ReadonlyMap<number, string>;
}

export interface PlanContext {
  /** Keyed by upper-case side number. */
  aircraft: ReadonlyMap<string, PlanAircraft>;
  /** Keyed by lower-case e-mail. */
  people: ReadonlyMap<string, PlanPerson>;
  cycle: PlanCycle;
}

/** A line matched to its aircraft and pilot, ready to become a slot. */
export interface ResolvedLine extends AirPlanLine {
  aircraftId: number;
  pilotId: number | null;
}

export interface CheckedPlan {
  /** Every line, filled with what could be matched. */
  rows: AirPlanRow[];
  /** The lines without a problem. */
  resolved: ResolvedLine[];
  problems: ImportProblem[];
}

export const sideKey = (side: string) => side.toUpperCase();

/**
 * Matches each line's side number and pilot e-mail against the fleet, the people and the cycle: the
 * rules of adding a slot (a known, serviceable aircraft not yet in the cycle; an active pilot not
 * flying another aircraft in it), within the file too, plus the type's maximum gross weight.
 */
export function checkAirPlan(lines: AirPlanLine[], context: PlanContext): CheckedPlan {
  const problems: ImportProblem[] = [];
  const rows: AirPlanRow[] = [];
  const resolved: ResolvedLine[] = [];
  const firstLineOfSide = new Map<string, number>();
  const firstLineOfPilot = new Map<number, { line: number; side: string }>();
  const { cycle } = context;

  for (const line of lines) {
    const before = problems.length;
    const flag = (column: string, value: string | null, reason: string) =>
      problems.push({ row: line.row, column, value, reason });

    const aircraft = context.aircraft.get(sideKey(line.sideNumber));
    const side = aircraft?.sideNumber ?? line.sideNumber;
    const earlier = firstLineOfSide.get(sideKey(side));
    if (!aircraft) flag('side_number', line.sideNumber, `No aircraft has the side number ${line.sideNumber}.`);
    else if (earlier !== undefined)
      flag('side_number', line.sideNumber, `${side} is already on line ${earlier}; an aircraft flies once in a cycle.`);
    else if (cycle.aircraftIds.has(aircraft.id))
      flag('side_number', line.sideNumber, `${side} is already in cycle ${cycle.number}.`);
    else if (!aircraft.serviceable) flag('side_number', line.sideNumber, `${side} is marked unserviceable.`);
    if (earlier === undefined) firstLineOfSide.set(sideKey(side), line.row);
    if (aircraft && line.grossWeightLb > aircraft.maxGrossWeightLb) {
      flag(
        'gross_weight_lb',
        String(line.grossWeightLb),
        `Over the ${aircraft.typeDesignation} maximum gross weight of ${aircraft.maxGrossWeightLb} lb.`,
      );
    }

    const pilot = line.pilotEmail === null ? undefined : context.people.get(line.pilotEmail);
    if (line.pilotEmail !== null) {
      const flying = pilot ? cycle.pilotsFlying.get(pilot.id) : undefined;
      const pilotEarlier = pilot ? firstLineOfPilot.get(pilot.id) : undefined;
      if (!pilot) flag('pilot_email', line.pilotEmail, 'Nobody signs in with this e-mail.');
      else if (pilot.role !== 'pilot' || !pilot.active)
        flag('pilot_email', line.pilotEmail, `${pilot.name} is not an active pilot.`);
      else if (flying)
        flag('pilot_email', line.pilotEmail, `${pilot.name} already flies ${flying} in cycle ${cycle.number}.`);
      else if (pilotEarlier)
        flag(
          'pilot_email',
          line.pilotEmail,
          `${pilot.name} already flies ${pilotEarlier.side} on line ${pilotEarlier.line}.`,
        );
      if (pilot && !pilotEarlier) firstLineOfPilot.set(pilot.id, { line: line.row, side });
    }

    rows.push({
      ...line,
      sideNumber: side,
      typeDesignation: aircraft?.typeDesignation ?? null,
      squadronCode: aircraft?.squadronCode ?? null,
      pilotName: pilot?.name ?? null,
    });
    if (problems.length === before && aircraft)
      resolved.push({ ...line, sideNumber: side, aircraftId: aircraft.id, pilotId: pilot?.id ?? null });
  }
  return { rows, resolved, problems };
}
