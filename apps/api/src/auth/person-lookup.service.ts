import { Injectable } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { InjectDataSource, InjectRepository } from '@nestjs/typeorm';
import type { DataSource, Repository } from 'typeorm';
import { type Environment, runsClustered } from '../config/environment.js';
import { EntityWriteCounter } from '../database/entity-write-counter.js';
import { User } from '../database/entities/user.entity.js';

/**
 * The person behind each access token, read once and then kept in memory until any person is written
 * (removed, deactivated, tokens withdrawn, renamed): every request checks its token against the person,
 * and a read per request was a tenth of the cost of a lineup command. The writes are counted from
 * TypeORM's entity events of this process, so with several API processes (REDIS_URL) every check reads.
 */
@Injectable()
export class PersonLookup {
  private readonly known = new Map<number, User>();
  private readonly personWrites?: EntityWriteCounter;
  private knownAt = 0;

  constructor(
    @InjectRepository(User) private readonly users: Repository<User>,
    @InjectDataSource() dataSource: DataSource,
    config: ConfigService<Environment, true>,
  ) {
    if (!runsClustered({ REDIS_URL: config.get('REDIS_URL', { infer: true }) }))
      this.personWrites = new EntityWriteCounter(dataSource, new Set([User]));
  }

  async byId(id: number): Promise<User | null> {
    if (!this.personWrites) return this.users.findOneBy({ id });
    const writes = this.personWrites.count;
    if (writes !== this.knownAt) {
      this.known.clear();
      this.knownAt = writes;
    }
    const known = this.known.get(id);
    if (known) return known;
    const person = await this.users.findOneBy({ id });
    if (person && this.personWrites.count === writes) this.known.set(id, person);
    return person;
  }
}
