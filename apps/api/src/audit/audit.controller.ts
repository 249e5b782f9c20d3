import { AUDIT_EXPORT_MAX_ROWS, type AuditEntryView, type Page } from '@catline/contracts';
import { Controller, Get, Query, type StreamableFile } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import type { AuthenticatedUser } from '../common/authenticated-user.js';
import { csvResponse } from '../common/csv-response.js';
import { CurrentUser } from '../common/decorators/current-user.decorator.js';
import { Roles } from '../common/decorators/roles.decorator.js';
import { ApiDoc } from '../common/openapi/api-doc.decorator.js';
import { AuditEntryPageDto } from '../common/openapi/views/audit.view.js';
import { AuditLog } from './audit-log.service.js';
import { AuditFilterDto, AuditPageQueryDto } from './dto/audit-query.dto.js';

const FILTERS =
  'Newest first; every filter given must hold: action, actor, ship (a fleet admin’s choice) and the instants ' +
  '`since` (included) to `until` (excluded). A range whose `until` is before its `since` is refused with 400.';

@ApiTags('audit')
@Controller('audit')
export class AuditController {
  constructor(private readonly log: AuditLog) {}

  @Roles('admin')
  @ApiDoc('List the audit trail, a page at a time', { response: AuditEntryPageDto, description: FILTERS })
  @Get()
  list(@CurrentUser() caller: AuthenticatedUser, @Query() query: AuditPageQueryDto): Promise<Page<AuditEntryView>> {
    return this.log.page(caller, query);
  }

  @Roles('admin')
  @ApiDoc('Download the filtered audit trail as CSV', {
    response: 'csv',
    description: `${FILTERS} At most ${AUDIT_EXPORT_MAX_ROWS} rows, newest first; times in each entry's ship's zone.`,
  })
  @Get('export.csv')
  async export(@CurrentUser() caller: AuthenticatedUser, @Query() filter: AuditFilterDto): Promise<StreamableFile> {
    return csvResponse(await this.log.csv(caller, filter));
  }
}
