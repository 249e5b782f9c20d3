import type { AirPlanPreview, AirPlanRow, LineupCommandResult, Page, SlotStatus, UploadView } from '@catline/contracts';
import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { type DataSource, type EntityManager, In } from 'typeorm';
import { Aircraft } from '../database/entities/aircraft.entity.js';
import type { AuthenticatedUser } from '../common/authenticated-user.js';
import type { PageWindow } from '../common/paging/page-query.dto.js';
import { Cycle } from '../database/entities/cycle.entity.js';
import { BasisChecks } from '../cycle-changes/basis-checks.service.js';
import { actorOf, CycleChangeService } from '../cycle-changes/cycle-change.service.js';
import { Slot } from '../database/entities/slot.entity.js';
import { startingPositions } from '../cycle-changes/starting-positions.js';
import { LineupException } from '../cycle-changes/lineup.exception.js';
import { User } from '../database/entities/user.entity.js';
import { AIR_PLAN_COLUMNS, AIR_PLAN_LAYOUT, type AirPlanLine, readAirPlan } from './air-plan-layout.js';
import { type CheckedPlan, checkAirPlan, type PlanContext, sideKey } from './air-plan-references.js';
import { sortProblems } from './csv-table.js';
import type { UploadedCsv } from './csv-upload.js';
import { ImportsException } from './imports.exception.js';
import { toImportPreview } from './upload.mapper.js';
import { UploadsService } from './uploads.service.js';

const NOT_FLYING: readonly SlotStatus[] = ['down', 'scratched'];

/** The cycle's slots as the check needs them: with their aircraft. */
type CycleSlot = Pick<Slot, 'aircraftId' | 'pilotId' | 'status'> & { aircraft: Pick<Aircraft, 'sideNumber'> };

/**
 * The fleet, people and cycle an air plan's lines are matched against, read with the caller's manager:
 * only the aircraft and people of the cycle's ship (another ship's side number is an unknown one).
 */
async function planContext(
  manager: EntityManager,
  lines: AirPlanLine[],
  cycle: Pick<Cycle, 'number' | 'shipId'>,
  slots: CycleSlot[],
): Promise<PlanContext> {
  const { shipId } = cycle;
  const sides = [...new Set(lines.map((line) => line.sideNumber))];
  const emails = [...new Set(lines.flatMap((line) => (line.pilotEmail === null ? [] : [line.pilotEmail])))];
  const [aircraft, people] = await Promise.all([
    sides.length === 0
      ? []
      : manager.find(Aircraft, {
          where: { sideNumber: In(sides), shipId },
          relations: { type: true, squadron: true },
        }),
    emails.length === 0 ? [] : manager.find(User, { where: { email: In(emails), shipId } }),
  ]);
  return {
    aircraft: new Map(
      aircraft.map((row) => [
        sideKey(row.sideNumber),
        {
          id: row.id,
          sideNumber: row.sideNumber,
          serviceable: row.serviceable,
          typeDesignation: row.type.designation,
          maxGrossWeightLb: row.type.maxGrossWeightLb,
          squadronCode: row.squadron.code,
        },
      ]),
    ),
    people: new Map(
      people.map((person) => [
        person.email,
        { id: person.id, name: person.name, email: person.email, role: person.role, active: person.active },
      ]),
    ),
    cycle: {
      number: cycle.number,
      aircraftIds: new Set(slots.map((slot) => slot.aircraftId)),
      pilotsFlying: new Map(
        slots.flatMap((slot) =>
          slot.pilotId !== null && !NOT_FLYING.includes(slot.status)
            ? [[slot.pilotId, slot.aircraft.sideNumber] as const]
            : [],
        ),
      ),
    },
  };
}

/**
 * Air plan import: a preview reads and checks the file and keeps it; its confirm adds every line to
 * the cycle's deck pool as one change of the cycle, or nothing at all.
 */
@Injectable()
export class AirPlanImports {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly uploads: UploadsService,
    private readonly changes: CycleChangeService,
    private readonly basis: BasisChecks,
  ) {}

  async listUploads(cycleId: number, window: PageWindow): Promise<Page<UploadView>> {
    if (!(await this.dataSource.manager.existsBy(Cycle, { id: cycleId })))
      throw new ImportsException('target_not_found', `Cycle ${cycleId} does not exist.`);
    return this.uploads.page({ kind: 'air_plan', cycleId }, window);
  }

  async preview(cycleId: number, file: UploadedCsv | undefined, user: AuthenticatedUser): Promise<AirPlanPreview> {
    const manager = this.dataSource.manager;
    const cycle = await manager.findOneBy(Cycle, { id: cycleId });
    if (!cycle) throw new ImportsException('target_not_found', `Cycle ${cycleId} does not exist.`);
    if (cycle.state === 'closed')
      throw new LineupException('cycle_closed', `Cycle ${cycle.number} is closed; an air plan no longer goes into it.`);
    const target = { kind: 'air_plan', cycleId } as const;
    const text = await this.uploads.textOf(file, target, user, AIR_PLAN_LAYOUT);
    const read = readAirPlan(text);
    const slots = await manager.find(Slot, { where: { cycleId }, relations: { aircraft: true } });
    const checked = checkAirPlan(read.lines, await planContext(manager, read.lines, cycle, slots));
    const problems = sortProblems([...read.problems, ...checked.problems], AIR_PLAN_COLUMNS);
    const upload = await this.uploads.record(file!, target, user, problems, checked.rows);
    return toImportPreview<AirPlanRow>(upload, checked.rows);
  }

  confirm(
    cycleId: number,
    uploadId: number,
    basisVersion: number,
    user: AuthenticatedUser,
  ): Promise<LineupCommandResult> {
    return this.changes.apply(cycleId, actorOf(user), 'air_plan_imported', async (manager, state) => {
      this.basis.requireOpen(state);
      const upload = await this.uploads.importable(manager, uploadId, { kind: 'air_plan', cycleId });
      await this.basis.cycleAsSeen(manager, state, basisVersion);
      const lines = upload.rows as AirPlanLine[];
      // The fleet, the people and the cycle may have moved on since the preview: checked again, under the cycle's lock.
      const checked = checkAirPlan(lines, await planContext(manager, lines, state.cycle, state.slots));
      if (checked.problems.length > 0) throw this.outOfDate(checked);
      const starts = await startingPositions(
        manager,
        state,
        checked.resolved.map((line) => line.aircraftId),
      );
      await manager.insert(
        Slot,
        checked.resolved.map((line) => ({
          ...starts.get(line.aircraftId),
          cycleId,
          aircraftId: line.aircraftId,
          pilotId: line.pilotId,
          mission: line.mission,
          fuelLb: line.fuelLb,
          stores: line.stores,
          grossWeightLb: line.grossWeightLb,
          tanker: line.tanker,
          earlyWarning: line.earlyWarning,
          spare: line.spare,
        })),
      );
      await this.uploads.markImported(manager, upload, user);
      const count = checked.resolved.length;
      return {
        summary: `Air plan ${upload.fileName} imported: ${count} aircraft added to the deck pool`,
        command: { type: 'import_air_plan', uploadId, fileName: upload.fileName, aircraft: count, basisVersion },
      };
    });
  }

  private outOfDate(checked: CheckedPlan): ImportsException {
    const details = sortProblems(checked.problems, AIR_PLAN_COLUMNS).map(
      (problem) => `Line ${problem.row}: ${problem.reason}`,
    );
    return new ImportsException(
      'import_out_of_date',
      `Nothing was imported: since the preview, ${details.length === 1 ? 'a problem has' : `${details.length} problems have`} come up (${details[0]}). Upload the file again to see them all.`,
      details,
    );
  }
}
