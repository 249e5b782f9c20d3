import { Injectable } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { InjectDataSource } from '@nestjs/typeorm';
import type { DataSource } from 'typeorm';
import { type Environment, runsClustered } from '../config/environment.js';
import { RefreshToken } from '../database/entities/refresh-token.entity.js';
import { User } from '../database/entities/user.entity.js';
import { RowsCache } from '../database/rows-cache.js';

/**
 * What every request and socket event checks its token against: the person (active, token version) and
 * their session (a live refresh token row). A read of each per request was a tenth of the cost of a lineup
 * command, so both are kept in memory until this process writes a person or a refresh token (sign-in,
 * refresh, logout, removal, role or password change): a session ended here is refused on the very next
 * request, with no window. The person's token version ends all their sessions in one write; the session row
 * is what lets logout end one session alone. With several API processes (REDIS_URL) every check reads, as
 * another process's writes are not seen here.
 */
@Injectable()
export class PersonLookup {
  private readonly people: RowsCache<number, User | null>;
  private readonly sessions: RowsCache<string, Date | null>;

  constructor(@InjectDataSource() dataSource: DataSource, config: ConfigService<Environment, true>) {
    const enabled = !runsClustered({ REDIS_URL: config.get('REDIS_URL', { infer: true }) });
    this.people = new RowsCache(dataSource, new Set([User]), (id) => dataSource.manager.findOneBy(User, { id }), {
      enabled,
    });
    this.sessions = new RowsCache(
      dataSource,
      new Set([RefreshToken]),
      async (sessionId) => {
        const live = await dataSource.manager
          .createQueryBuilder(RefreshToken, 'token')
          .select('MAX(token.expiresAt)', 'expiresAt')
          .where('token.sessionId = :sessionId AND token.revokedAt IS NULL', { sessionId })
          .getRawOne<{ expiresAt: Date | string | null }>();
        return live?.expiresAt ? new Date(live.expiresAt) : null;
      },
      { enabled },
    );
  }

  byId(id: number): Promise<User | null> {
    return this.people.get(id);
  }

  /** Whether the session still has a live refresh token (not ended by logout, removal or a password change). */
  async sessionLive(sessionId: string): Promise<boolean> {
    const expiresAt = await this.sessions.get(sessionId);
    return expiresAt !== null && expiresAt.getTime() > Date.now();
  }
}
