import type { AircraftTypeView, LaunchTableImportRow, LaunchTablePreview, Page, UploadView } from '@catline/contracts';
import { Injectable, Logger } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import type { DataSource } from 'typeorm';
import { AuditTrail } from '../audit/audit-trail.service.js';
import { toAircraftTypeView } from '../aircraft-types/aircraft-type.mapper.js';
import { LaunchDataReverify } from '../aircraft-types/launch-data-reverify.service.js';
import { AircraftType } from '../database/entities/aircraft-type.entity.js';
import type { AuthenticatedUser } from '../common/authenticated-user.js';
import { actorOf } from '../cycle-changes/cycle-change.service.js';
import type { PageWindow } from '../common/paging/page-query.dto.js';
import { shipWhere } from '../common/ship-scope.js';
import { sortProblems } from './csv-table.js';
import type { UploadedCsv } from './csv-upload.js';
import { ImportsException } from './imports.exception.js';
import { LAUNCH_TABLE_COLUMNS, LAUNCH_TABLE_LAYOUT, readLaunchTable } from './launch-table-layout.js';
import { toImportPreview } from './upload.mapper.js';
import { UploadsService } from './uploads.service.js';

const notFound = (id: number) => new ImportsException('target_not_found', `There is no aircraft type with id ${id}.`);

/**
 * Launch table import: a preview reads and checks the file; its confirm replaces the type's table whole.
 * A type of another ship than the caller's is answered as one that does not exist.
 */
@Injectable()
export class LaunchTableImports {
  private readonly logger = new Logger(LaunchTableImports.name);

  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly uploads: UploadsService,
    private readonly audit: AuditTrail,
    private readonly reverify: LaunchDataReverify,
  ) {}

  async listUploads(typeId: number, user: AuthenticatedUser, window: PageWindow): Promise<Page<UploadView>> {
    if (!(await this.dataSource.manager.existsBy(AircraftType, { id: typeId, ...shipWhere(user) })))
      throw notFound(typeId);
    return this.uploads.page({ kind: 'launch_table', aircraftTypeId: typeId }, window);
  }

  async preview(typeId: number, file: UploadedCsv | undefined, user: AuthenticatedUser): Promise<LaunchTablePreview> {
    if (!(await this.dataSource.manager.existsBy(AircraftType, { id: typeId, ...shipWhere(user) })))
      throw notFound(typeId);
    const target = { kind: 'launch_table', aircraftTypeId: typeId } as const;
    const { rows, problems } = readLaunchTable(await this.uploads.textOf(file, target, user, LAUNCH_TABLE_LAYOUT));
    const upload = await this.uploads.record(file!, target, user, sortProblems(problems, LAUNCH_TABLE_COLUMNS), rows);
    return toImportPreview(upload, rows);
  }

  async confirm(typeId: number, uploadId: number, user: AuthenticatedUser): Promise<AircraftTypeView> {
    const replaced = await this.dataSource.transaction(async (manager) => {
      const type = await manager.findOne(AircraftType, {
        where: { id: typeId, ...shipWhere(user) },
        lock: { mode: 'pessimistic_write' },
      });
      if (!type) throw notFound(typeId);
      const upload = await this.uploads.importable(manager, uploadId, { kind: 'launch_table', aircraftTypeId: typeId });
      const before = type.launchTable;
      type.launchTable = (upload.rows as LaunchTableImportRow[]).map(({ grossWeightLb, minLaunchAirspeedKt }) => ({
        grossWeightLb,
        minLaunchAirspeedKt,
      }));
      await manager.save(AircraftType, type);
      await this.uploads.markImported(manager, upload, user);
      await this.audit.record(manager, {
        action: 'launch_table.replaced',
        subject: { type: 'aircraft_type', id: typeId },
        shipId: type.shipId,
        summary: `Launch table of ${type.designation} replaced from upload ${upload.id} (${type.launchTable.length} rows)`,
        before: { launchTable: before },
        after: { launchTable: type.launchTable },
      });
      this.logger.log(
        `Launch table of ${type.designation} replaced from upload ${upload.id} (${type.launchTable.length} rows)`,
      );
      return toAircraftTypeView(type);
    });
    await this.reverify.launchDataChanged(replaced, 'The launch table', actorOf(user));
    return replaced;
  }
}
