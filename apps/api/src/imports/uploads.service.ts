import { createHash } from 'node:crypto';
import {
  type ImportProblem,
  MAX_IMPORT_PROBLEMS,
  MAX_PROBLEM_VALUE_CHARS,
  type Page,
  type UploadView,
} from '@catline/contracts';
import { Injectable, Logger } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { type DataSource, type EntityManager, LessThan } from 'typeorm';
import type { AuthenticatedUser } from '../common/authenticated-user.js';
import { pageOf, type PageWindow } from '../common/paging/page-query.dto.js';
import { toUploadView } from './upload.mapper.js';
import { type CsvLayout, headerWidthProblem } from './csv-table.js';
import { csvText, notCsvReason, type UploadedCsv, CSV_FIELD } from './csv-upload.js';
import { Upload, type UploadKind } from '../database/entities/upload.entity.js';
import { ImportsException } from './imports.exception.js';

/** What an upload is for: an air plan's cycle or a launch table's aircraft type. */
export type UploadTarget = { kind: 'air_plan'; cycleId: number } | { kind: 'launch_table'; aircraftTypeId: number };

const KIND_NAMES: Record<UploadKind, string> = { air_plan: 'air plan', launch_table: 'launch table' };

/** A rejected upload is kept this long for the record, then deleted: nothing will ever import it. */
export const REJECTED_UPLOAD_LIFETIME_MS = 24 * 3_600_000;

/** The problem as kept and answered: its cell cut short, so a huge cell is not repeated back whole. */
function shortened(problem: ImportProblem): ImportProblem {
  const { value } = problem;
  return value !== null && value.length > MAX_PROBLEM_VALUE_CHARS
    ? { ...problem, value: `${value.slice(0, MAX_PROBLEM_VALUE_CHARS)}…` }
    : problem;
}

/** Keeps every upload with its outcome, and hands a confirmed one over exactly once. */
@Injectable()
export class UploadsService {
  private readonly logger = new Logger(UploadsService.name);

  constructor(@InjectDataSource() private readonly dataSource: DataSource) {}

  /** The file's CSV text; a file that is not CSV text, or whose header is far wider than the layout, is kept as rejected and refused. */
  async textOf<Column extends string>(
    file: UploadedCsv | undefined,
    target: UploadTarget,
    by: AuthenticatedUser,
    layout: CsvLayout<Column>,
  ): Promise<string> {
    if (!file) throw new ImportsException('file_missing', `Attach the CSV file in the form field "${CSV_FIELD}".`);
    const reason = notCsvReason(file);
    if (reason !== null) {
      await this.record(file, target, by, [{ row: 1, column: null, value: null, reason }], null);
      throw new ImportsException('not_csv', reason);
    }
    const text = csvText(file);
    const tooWide = headerWidthProblem(text, layout, KIND_NAMES[target.kind]);
    if (tooWide !== null) {
      await this.record(file, target, by, [{ row: 1, column: null, value: null, reason: tooWide }], null);
      throw new ImportsException('header_too_wide', tooWide);
    }
    return text;
  }

  /**
   * Keeps the upload: accepted when nothing is wrong, rejected otherwise, with its first problems and
   * their count; the rows only when accepted. Rejected uploads older than a day go at the same time.
   */
  async record(
    file: UploadedCsv,
    target: UploadTarget,
    by: AuthenticatedUser,
    problems: ImportProblem[],
    rows: object[] | null,
  ): Promise<Upload> {
    const accepted = problems.length === 0;
    await this.dataSource.manager.delete(Upload, {
      result: 'rejected',
      uploadedAt: LessThan(new Date(Date.now() - REJECTED_UPLOAD_LIFETIME_MS)),
    });
    const upload = this.dataSource.manager.create(Upload, {
      kind: target.kind,
      cycleId: target.kind === 'air_plan' ? target.cycleId : null,
      aircraftTypeId: target.kind === 'launch_table' ? target.aircraftTypeId : null,
      uploadedById: by.id,
      uploadedAt: new Date(),
      fileName: file.originalname.slice(0, 255),
      mimeType: file.mimetype.slice(0, 100),
      sizeBytes: file.size,
      sha256: createHash('sha256').update(file.buffer).digest('hex'),
      result: accepted ? 'accepted' : 'rejected',
      problemCount: problems.length,
      problems: problems.slice(0, MAX_IMPORT_PROBLEMS).map(shortened),
      rows: accepted ? rows : null,
      importedAt: null,
      importedById: null,
    });
    await this.dataSource.manager.save(Upload, upload);
    this.logger.log(
      `Upload ${upload.id} (${upload.kind}, ${upload.fileName}, ${upload.sizeBytes} B) ${upload.result} with ${upload.problemCount} problems`,
    );
    return upload;
  }

  /** The target's uploads, newest first, a page at a time; the rows and problems they keep stay out. */
  async page(target: UploadTarget, window: PageWindow): Promise<Page<UploadView>> {
    const [uploads, total] = await this.dataSource.manager.findAndCount(Upload, {
      select: {
        id: true,
        fileName: true,
        sizeBytes: true,
        uploadedAt: true,
        uploadedById: true,
        result: true,
        problemCount: true,
        importedAt: true,
      },
      where:
        target.kind === 'air_plan'
          ? { kind: target.kind, cycleId: target.cycleId }
          : { kind: target.kind, aircraftTypeId: target.aircraftTypeId },
      order: { uploadedAt: 'DESC', id: 'DESC' },
      take: window.limit,
      skip: window.offset,
    });
    return pageOf(window, uploads.map(toUploadView), total);
  }

  /** The upload, locked until the transaction ends, when it is an accepted one of this target; refuses otherwise. */
  async importable(manager: EntityManager, id: number, target: UploadTarget): Promise<Upload & { rows: object[] }> {
    const upload = await manager.findOne(Upload, { where: { id }, lock: { mode: 'pessimistic_write' } });
    const targetId = target.kind === 'air_plan' ? upload?.cycleId : upload?.aircraftTypeId;
    const wanted = target.kind === 'air_plan' ? target.cycleId : target.aircraftTypeId;
    if (!upload || upload.kind !== target.kind || targetId !== wanted) {
      throw new ImportsException(
        'upload_not_found',
        `There is no ${KIND_NAMES[target.kind]} upload ${id} for this ${target.kind === 'air_plan' ? 'cycle' : 'aircraft type'}.`,
      );
    }
    if (upload.result === 'imported') {
      throw new ImportsException('upload_not_importable', `${upload.fileName} (upload ${id}) is already imported.`);
    }
    if (upload.result === 'rejected' || upload.rows === null) {
      throw new ImportsException(
        'upload_not_importable',
        `${upload.fileName} (upload ${id}) had ${upload.problemCount} problem${upload.problemCount === 1 ? '' : 's'} in its preview, so nothing of it is imported. Fix the file and upload it again.`,
      );
    }
    return upload as Upload & { rows: object[] };
  }

  async markImported(manager: EntityManager, upload: Upload, by: AuthenticatedUser): Promise<void> {
    await manager.update(
      Upload,
      { id: upload.id },
      { result: 'imported', importedAt: new Date(), importedById: by.id },
    );
  }
}
