import type { ImportRefusalCode } from '@catline/contracts';
import { HttpStatus } from '@nestjs/common';
import { DomainException } from '../common/errors/domain.exception.js';

const STATUS: Record<ImportRefusalCode, HttpStatus> = {
  file_missing: HttpStatus.BAD_REQUEST,
  file_too_large: HttpStatus.PAYLOAD_TOO_LARGE,
  not_csv: HttpStatus.UNSUPPORTED_MEDIA_TYPE,
  header_too_wide: HttpStatus.BAD_REQUEST,
  target_not_found: HttpStatus.NOT_FOUND,
  upload_not_found: HttpStatus.NOT_FOUND,
  upload_not_importable: HttpStatus.CONFLICT,
  import_out_of_date: HttpStatus.CONFLICT,
};

/** Refusals of an upload or its confirm; problems inside a readable CSV are answered in the preview instead. */
export class ImportsException extends DomainException {
  constructor(code: ImportRefusalCode, message: string, details?: string[]) {
    super(STATUS[code], code, message, details);
  }
}
