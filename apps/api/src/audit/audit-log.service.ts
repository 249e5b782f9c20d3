import {
  AUDIT_EXPORT_MAX_ROWS,
  DEFAULT_SHIP_TIME_ZONE,
  shipIsoTime,
  shipTimeZone,
  type AuditEntryView,
  type Page,
} from '@catline/contracts';
import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { In, type DataSource, type SelectQueryBuilder } from 'typeorm';
import { toCsv } from '../common/csv.js';
import type { ShipScope } from '../common/ship-scope.js';
import { pageOf } from '../common/paging/page-query.dto.js';
import type { CsvFile } from '../common/csv-response.js';
import { AuditEntry } from '../database/entities/audit-entry.entity.js';
import { Ship } from '../database/entities/ship.entity.js';
import { toAuditEntryView } from './audit-entry.mapper.js';
import type { AuditFilterDto, AuditPageQueryDto } from './dto/audit-query.dto.js';

const CSV_HEADER = [
  'id',
  'at',
  'actor id',
  'actor e-mail',
  'actor role',
  'client address',
  'action',
  'subject type',
  'subject id',
  'ship id',
  'summary',
  'before',
  'after',
  'time zone',
];

/** Reading the audit trail of the caller's ship (every ship's for a fleet admin): newest first, filtered, a page at a time or as a CSV file. */
@Injectable()
export class AuditLog {
  constructor(@InjectDataSource() private readonly dataSource: DataSource) {}

  async page(scope: ShipScope, query: AuditPageQueryDto): Promise<Page<AuditEntryView>> {
    const [entries, total] = await this.select(scope, query).take(query.limit).skip(query.offset).getManyAndCount();
    return pageOf(query, entries.map(toAuditEntryView), total);
  }

  async csv(scope: ShipScope, filter: AuditFilterDto): Promise<CsvFile> {
    const entries = await this.select(scope, filter).take(AUDIT_EXPORT_MAX_ROWS).getMany();
    const zones = await this.shipZones(entries);
    const rows = entries.map((entry) => [
      entry.id,
      shipIsoTime(entry.at, zones(entry.shipId)),
      entry.actorId,
      entry.actorEmail,
      entry.actorRole,
      entry.clientAddress,
      entry.action,
      entry.subjectType,
      entry.subjectId,
      entry.shipId,
      entry.summary,
      entry.before ? JSON.stringify(entry.before) : null,
      entry.after ? JSON.stringify(entry.after) : null,
      zones(entry.shipId),
    ]);
    return { fileName: 'audit-trail.csv', content: toCsv(CSV_HEADER, rows) };
  }

  /** Each entry is told in its ship's zone; one that belongs to no ship (a fleet-wide change) in the default. */
  private async shipZones(entries: AuditEntry[]): Promise<(shipId: number | null) => string> {
    const ids = [...new Set(entries.flatMap((entry) => (entry.shipId === null ? [] : [entry.shipId])))];
    const ships = ids.length ? await this.dataSource.manager.find(Ship, { where: { id: In(ids) } }) : [];
    const zones = new Map(ships.map((ship) => [ship.id, shipTimeZone(ship.profile)]));
    return (shipId) => (shipId === null ? undefined : zones.get(shipId)) ?? DEFAULT_SHIP_TIME_ZONE;
  }

  private select(scope: ShipScope, filter: AuditFilterDto): SelectQueryBuilder<AuditEntry> {
    const query = this.dataSource.manager
      .createQueryBuilder(AuditEntry, 'entry')
      .orderBy('entry.at', 'DESC')
      .addOrderBy('entry.id', 'DESC');
    if (scope.shipId !== null) query.andWhere('entry.shipId = :own', { own: scope.shipId });
    if (filter.ship) query.andWhere('entry.shipId = :ship', { ship: filter.ship });
    if (filter.action) query.andWhere('entry.action = :action', { action: filter.action });
    // The column's collation (utf8mb4_unicode_ci) ignores case and accents, as sign-in does.
    if (filter.actor) query.andWhere('entry.actorEmail = :actor', { actor: filter.actor.trim() });
    if (filter.since) query.andWhere('entry.at >= :since', { since: new Date(filter.since) });
    if (filter.until) query.andWhere('entry.at < :until', { until: new Date(filter.until) });
    return query;
  }
}
