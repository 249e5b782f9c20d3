import type { ImportPreview, UploadView } from '@catline/contracts';
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

export function toUploadView(upload: Upload): UploadView {
  return {
    id: upload.id,
    fileName: upload.fileName,
    sizeBytes: upload.sizeBytes,
    uploadedAt: upload.uploadedAt.toISOString(),
    uploadedById: upload.uploadedById,
    result: upload.result,
    problemCount: upload.problemCount,
    importedAt: upload.importedAt?.toISOString() ?? null,
  };
}
