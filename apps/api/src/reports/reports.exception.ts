import type { ReportRefusalCode } from '@catline/contracts';
import { HttpStatus } from '@nestjs/common';
import { DomainException } from '../common/errors/domain.exception.js';

const STATUS: Record<ReportRefusalCode, HttpStatus> = {
  invalid_date_range: HttpStatus.BAD_REQUEST,
};

export class ReportsException extends DomainException {
  constructor(code: ReportRefusalCode, message: string) {
    super(STATUS[code], code, message);
  }
}
