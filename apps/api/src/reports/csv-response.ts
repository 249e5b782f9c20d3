import { StreamableFile } from '@nestjs/common';
import type { CsvFile } from './csv-file.js';

/** A CSV answer the browser saves under the file's name. */
export function csvResponse(file: CsvFile): StreamableFile {
  return new StreamableFile(Buffer.from(file.content, 'utf8'), {
    type: 'text/csv; charset=utf-8',
    disposition: `attachment; filename="${file.fileName}"`,
  });
}
