import { shipTimeZone, type CycleReplay, type CycleReport } from '@catline/contracts';
import { Injectable } from '@nestjs/common';
import { toCsv } from '../common/csv.js';
import { toLineupChange } from '../cycle-changes/change.mapper.js';
import { buildSnapshot } from '../cycle-changes/lineup-snapshot.builder.js';
import { asLaunchDataRefusal } from '../cycle-changes/lineup.exception.js';
import { buildCycleReport } from './cycle-report.builder.js';
import { CycleRecordReader } from './cycle-record.reader.js';
import { CHANGE_COLUMNS, SLOT_COLUMNS, changeRows, slotRows } from './cycle-csv.js';
import type { CsvFile } from '../common/csv-response.js';
import { versionZeroState } from './replay-start.js';

/** A cycle's record for people: the report, the replay and the CSV exports. */
@Injectable()
export class CycleReportsService {
  constructor(private readonly reader: CycleRecordReader) {}

  async report(cycleId: number): Promise<CycleReport> {
    const { state, rows } = await this.reader.read(cycleId);
    return buildCycleReport({ state, changes: rows.map(toLineupChange) });
  }

  async replay(cycleId: number): Promise<CycleReplay> {
    const { state, rows } = await this.reader.read(cycleId);
    const changes = rows.map(toLineupChange);
    try {
      return { start: buildSnapshot(versionZeroState(state, changes[0]?.patch.cycle)), changes };
    } catch (error) {
      throw asLaunchDataRefusal(error);
    }
  }

  async slotsCsv(cycleId: number): Promise<CsvFile> {
    const { state, rows } = await this.reader.read(cycleId);
    const report = buildCycleReport({ state, changes: rows.map(toLineupChange) });
    return { fileName: `cycle-${state.cycle.number}-slots.csv`, content: toCsv(SLOT_COLUMNS, slotRows(state, report)) };
  }

  async changesCsv(cycleId: number): Promise<CsvFile> {
    const { state, rows } = await this.reader.read(cycleId);
    return {
      fileName: `cycle-${state.cycle.number}-changes.csv`,
      content: toCsv(CHANGE_COLUMNS, changeRows(rows, shipTimeZone(state.ship.profile))),
    };
  }
}
