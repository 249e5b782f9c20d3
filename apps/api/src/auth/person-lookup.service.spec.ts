import type { ConfigService } from '@nestjs/config';
import type { DataSource, EntitySubscriberInterface } from 'typeorm';
import type { Environment } from '../config/environment.js';
import { User } from '../database/entities/user.entity.js';
import { PersonLookup } from './person-lookup.service.js';

function lookup(redisUrl?: string) {
  const rows = new Map([[3, Object.assign(new User(), { id: 3, name: 'Ines Calloway', active: true })]]);
  const reads: number[] = [];
  const manager = {
    findOneBy: async (_entity: unknown, { id }: { id: number }) => {
      reads.push(id);
      return rows.get(id) ?? null;
    },
  };
  const dataSource = { subscribers: [] as EntitySubscriberInterface[], manager };
  const config = { get: () => redisUrl } as unknown as ConfigService<Environment, true>;
  const people = new PersonLookup(dataSource as unknown as DataSource, config);
  const personWritten = () =>
    dataSource.subscribers.forEach((subscriber) =>
      subscriber.afterUpdate?.({ metadata: { target: User }, queryRunner: { isTransactionActive: false } } as never),
    );
  return { people, reads, rows, personWritten };
}

describe('PersonLookup', () => {
  it('reads a person once, and again after any person was written', async () => {
    const { people, reads, rows, personWritten } = lookup();
    await people.byId(3);
    await people.byId(3);
    expect(reads).toEqual([3]);

    rows.get(3)!.active = false;
    personWritten();
    expect((await people.byId(3))?.active).toBe(false);
    expect(reads).toEqual([3, 3]);
  });

  it('does not keep a person who does not exist', async () => {
    const { people, reads } = lookup();
    expect(await people.byId(99)).toBeNull();
    expect(await people.byId(99)).toBeNull();
    expect(reads).toEqual([99, 99]);
  });

  it('reads every time with several API processes, whose writes it would not see', async () => {
    const { people, reads } = lookup('redis://127.0.0.1:6380');
    await people.byId(3);
    await people.byId(3);
    expect(reads).toEqual([3, 3]);
  });
});
