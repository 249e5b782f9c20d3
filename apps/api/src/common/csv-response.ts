import { StreamableFile } from '@nestjs/common';

/** A CSV document and the name it is saved under. */
export interface CsvFile {
  fileName: string;
  content: string;
}

/** A CSV answer the browser saves under the file's name. */
export function csvResponse(file: CsvFile): StreamableFile {
  return new StreamableFile(Buffer.from(file.content, 'utf8'), {
    type: 'text/csv; charset=utf-8',
    disposition: `attachment; filename="${file.fileName}"`,
  });
}
