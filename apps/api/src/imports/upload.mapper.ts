import type { ImportPreview } from '@catline/contracts';
import type { Upload } from '../database/entities/upload.entity.js';

export function toImportPreview<Row>(upload: Upload, rows: Row[]): ImportPreview<Row> {
  return {
    uploadId: upload.id,
    fileName: upload.fileName,
    result: upload.result === 'accepted' ? 'accepted' : 'rejected',
    rows,
    problems: upload.problems,
    problemCount: upload.problemCount,
  };
}
