import {
  type CallHandler,
  type ExecutionContext,
  HttpException,
  Injectable,
  type NestInterceptor,
  PayloadTooLargeException,
} from '@nestjs/common';
import { FileInterceptor } from '@nestjs/platform-express';
import type { Observable } from 'rxjs';
import { ImportsException } from './imports.exception.js';

export const CSV_MAX_BYTES = 256 * 1024;
export const CSV_FIELD = 'file';

/** The file multer kept in memory (its own type lives in @types/multer, which we do without). */
export interface UploadedCsv {
  originalname: string;
  mimetype: string;
  size: number;
  buffer: Buffer;
}

/** What spreadsheet programs and browsers send a .csv file as. */
const CSV_MIME_TYPES = ['text/csv', 'text/plain', 'application/vnd.ms-excel'];

const Multer = FileInterceptor(CSV_FIELD, { limits: { fileSize: CSV_MAX_BYTES, files: 1 } });

/** Receives one multipart file of at most CSV_MAX_BYTES into memory; multer's refusals become ours. */
@Injectable()
export class CsvUploadInterceptor implements NestInterceptor {
  private readonly multer: NestInterceptor = new Multer();

  async intercept(context: ExecutionContext, next: CallHandler): Promise<Observable<unknown>> {
    try {
      return await this.multer.intercept(context, next);
    } catch (error) {
      if (error instanceof PayloadTooLargeException) {
        throw new ImportsException(
          'file_too_large',
          `The file is larger than ${CSV_MAX_BYTES / 1024} KB; nothing was read. Split it or remove what is not needed.`,
        );
      }
      if (error instanceof HttpException) {
        throw new ImportsException(
          'file_missing',
          `The upload could not be read (${error.message}). Send one CSV file in the form field "${CSV_FIELD}".`,
        );
      }
      throw error;
    }
  }
}

// Text has no control characters but tab and line ends; anything else (NUL above all) marks a binary file.
function hasBinaryBytes(buffer: Buffer): boolean {
  for (const byte of buffer) {
    if ((byte < 0x20 && byte !== 0x09 && byte !== 0x0a && byte !== 0x0d) || byte === 0x7f) return true;
  }
  return false;
}

/** Why the file is not a CSV text we read, or null when it is one. */
export function notCsvReason(file: UploadedCsv): string | null {
  if (!/\.csv$/i.test(file.originalname))
    return `"${file.originalname}" is not a .csv file; save the sheet as CSV (UTF-8) and upload that.`;
  const mime = file.mimetype.toLowerCase().split(';')[0].trim();
  if (!CSV_MIME_TYPES.includes(mime)) return `The file was sent as ${mime}, not as CSV text (text/csv).`;
  if (hasBinaryBytes(file.buffer)) {
    return 'The file holds binary data, not CSV text; save the sheet as CSV (UTF-8) and upload that.';
  }
  try {
    new TextDecoder('utf-8', { fatal: true }).decode(file.buffer);
  } catch {
    return 'The file is not UTF-8 text; save the sheet as CSV (UTF-8) and upload that.';
  }
  return null;
}

/** The file's text, once notCsvReason has passed it (a leading byte-order mark is left to the CSV reader). */
export const csvText = (file: UploadedCsv) => file.buffer.toString('utf8');
