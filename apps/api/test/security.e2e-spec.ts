import { execFileSync, spawnSync } from 'node:child_process';
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { ROLES, type Role } from '@catline/contracts';
import type { INestApplication } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { JwtService } from '@nestjs/jwt';
import request from 'supertest';
import { DataSource } from 'typeorm';
import { matrixSocketEvents } from './role-matrix/index.js';
import { TEST_PASSWORD, createUser } from './support/fleet-fixtures.js';
import { gatewayEvents } from './support/gateway-events.js';
import { LineupDriver } from './support/lineup-fixtures.js';
import { bearer, demoEmail, signIn } from './support/sign-in.js';
import { type ClientSocket, connected, openSocket } from './support/socket-client.js';
import { startTestApp } from './support/test-app.js';

const REPOSITORY = fileURLToPath(new URL('../../..', import.meta.url));

type AnyEmitter = { timeout(ms: number): { emitWithAck(event: string, ...args: unknown[]): Promise<unknown> } };

describe('security', () => {
  let app: INestApplication;
  let url: string;
  let origin: string;
  let dataSource: DataSource;
  const tokens = new Map<Role, string>();
  const sockets: ClientSocket[] = [];

  beforeAll(async () => {
    ({ app, url } = await startTestApp());
    origin = app.get(ConfigService).get<string>('WEB_ORIGINS')!.split(',')[0].trim();
    dataSource = app.get(DataSource);
    for (const role of ROLES) tokens.set(role, await signIn(url, demoEmail(role)));
  });

  afterEach(() => {
    for (const socket of sockets.splice(0)) socket.disconnect();
  });

  afterAll(async () => {
    await app.close();
  });

  async function open(token?: string): Promise<ClientSocket> {
    const socket = openSocket(url, { token, origin });
    sockets.push(socket);
    await connected(socket);
    return socket;
  }

  async function refusalCode(token: string | undefined): Promise<string | undefined> {
    return open(token).then(
      () => 'connected',
      (error: Error & { data?: { code?: string } }) => error.data?.code,
    );
  }

  async function fingerprint(): Promise<string> {
    const tables = dataSource.entityMetadatas.map((metadata) => `\`${metadata.tableName}\``).join(', ');
    return JSON.stringify(await dataSource.query(`CHECKSUM TABLE ${tables}`));
  }

  describe('socket role matrix', () => {
    it('has a row for every event any gateway answers, each with the roles the gateway enforces', () => {
      const answered = gatewayEvents(app).map(({ event, allowed }) => ({ event, allowed }));
      expect(answered.length).toBeGreaterThan(0);
      expect(answered.sort((a, b) => a.event.localeCompare(b.event))).toEqual(
        matrixSocketEvents
          .map(({ event, allowed }) => ({ event, allowed: [...allowed] }))
          .sort((a, b) => a.event.localeCompare(b.event)),
      );
    });

    it.each(ROLES.map((role) => [role]))(
      'lets %s send every event, and none of them changes the database',
      async (role) => {
        const cycle = await new LineupDriver(url, () => tokens.get('air_operations')).createCycle();
        const socket = await open(tokens.get(role));
        for (const row of matrixSocketEvents) {
          const before = await fingerprint();
          const answer = await (socket as unknown as AnyEmitter)
            .timeout(5_000)
            .emitWithAck(row.event, row.example(cycle.id, tokens.get(role)!));
          expect({ event: row.event, answer }).toMatchObject({
            event: row.event,
            answer: { ok: row.allowed.includes(role) },
          });
          expect(await fingerprint()).toBe(before);
        }
      },
    );

    it('refuses a connection without a token or with a malformed one', async () => {
      expect(await refusalCode(undefined)).toBe('unauthenticated');
      expect(await refusalCode('')).toBe('unauthenticated');
      expect(await refusalCode('a.b.c')).toBe('session_invalid');
    });

    it('ignores events it does not know: no answer, nothing changed, the connection stays', async () => {
      const socket = await open(tokens.get('pilot'));
      const before = await fingerprint();
      for (const event of [
        'lineup:move',
        'slot:launch',
        'cycle:close',
        'cycle:start',
        'users:delete',
        'lineup:change',
      ]) {
        const answer = await (socket as unknown as AnyEmitter)
          .timeout(300)
          .emitWithAck(event, { cycleId: 1, slotId: 1 })
          .catch(() => 'no answer');
        expect({ event, answer }).toEqual({ event, answer: 'no answer' });
      }
      expect(socket.connected).toBe(true);
      expect(await fingerprint()).toBe(before);
    });
  });

  // HTTP refusals of these tokens are in auth.e2e-spec.ts; these are the same tokens at the socket handshake.
  describe('socket handshake refuses', () => {
    const claimsOf = (token: string) =>
      app.get(JwtService).decode<{ sub: number; role: string; tv: number; sid: string; exp: number }>(token);

    it('a token signed with another key', async () => {
      const { sub, role, tv, sid } = claimsOf(tokens.get('observer')!);
      const forged = new JwtService().sign(
        { sub, role, tv, sid },
        { secret: 'another-key-of-at-least-32-chars!!', algorithm: 'HS256', expiresIn: 600 },
      );
      expect(await refusalCode(forged)).toBe('session_invalid');
    });

    it('an unsigned token (alg none), even claiming to be the admin', async () => {
      const { sub, tv, sid, exp } = claimsOf(tokens.get('admin')!);
      const encode = (part: object) => Buffer.from(JSON.stringify(part)).toString('base64url');
      const unsigned = `${encode({ alg: 'none', typ: 'JWT' })}.${encode({ sub, role: 'admin', tv, sid, exp })}.`;
      expect(await refusalCode(unsigned)).toBe('session_invalid');
    });

    it('an expired token', async () => {
      const { sub, role, tv, sid } = claimsOf(tokens.get('observer')!);
      const now = Math.floor(Date.now() / 1000);
      const expired = await app.get(JwtService).signAsync({ sub, role, tv, sid, iat: now - 1_000, exp: now - 60 });
      expect(await refusalCode(expired)).toBe('session_invalid');
    });

    it('the token of a person removed since', async () => {
      const person = await createUser(url, tokens.get('admin')!, 'handler');
      const token = await signIn(url, person.email, TEST_PASSWORD);
      expect(await refusalCode(token)).toBe('connected');
      expect(
        (
          await request(url)
            .delete(`/api/users/${person.id}`)
            .set(bearer(tokens.get('admin')!))
        ).status,
      ).toBe(204);
      expect(await refusalCode(token)).toBe('session_invalid');
    });
  });

  describe('HTTP', () => {
    it('sets the security headers on every answer', async () => {
      for (const path of ['/api/health', '/api/auth/me', '/api/nowhere']) {
        const response = await request(url).get(path);
        expect(response.headers['content-security-policy']).toContain("default-src 'self'");
        expect(response.headers['x-content-type-options']).toBe('nosniff');
        expect(response.headers['referrer-policy']).toBe('no-referrer');
        expect(response.headers['x-powered-by']).toBeUndefined();
      }
    });

    it('grants CORS to the configured web origins only', async () => {
      const preflight = (from: string) =>
        request(url)
          .options('/api/cycles')
          .set('Origin', from)
          .set('Access-Control-Request-Method', 'POST')
          .set('Access-Control-Request-Headers', 'authorization,content-type');
      const allowed = await preflight(origin);
      expect(allowed.headers['access-control-allow-origin']).toBe(origin);
      expect(allowed.headers['access-control-allow-credentials']).toBe('true');
      for (const foreign of ['http://elsewhere.example', 'null', `${origin}.elsewhere.example`]) {
        const refused = await preflight(foreign);
        expect({ foreign, allow: refused.headers['access-control-allow-origin'] }).toEqual({
          foreign,
          allow: undefined,
        });
        const simple = await request(url).get('/api/health').set('Origin', foreign);
        expect(simple.headers['access-control-allow-origin']).toBeUndefined();
      }
    });
  });

  describe('MariaDB durability', () => {
    it('flushes the InnoDB log and the binary log at every commit', async () => {
      const rows = (await dataSource.query(
        "SHOW VARIABLES WHERE Variable_name IN ('innodb_flush_log_at_trx_commit', 'sync_binlog')",
      )) as { Variable_name: string; Value: string }[];
      expect(Object.fromEntries(rows.map((row) => [row.Variable_name, row.Value]))).toEqual({
        innodb_flush_log_at_trx_commit: '1',
        sync_binlog: '1',
      });
    });
  });

  describe('the repository', () => {
    const files = execFileSync('git', ['ls-files', '--cached', '--others', '--exclude-standard'], {
      cwd: REPOSITORY,
      encoding: 'utf8',
    })
      .split('\n')
      .filter(Boolean);

    it('keeps .env and the local data out of git', () => {
      for (const ignored of ['.env', '.data/mariadb/ibdata1', 'apps/api/.env']) {
        expect({
          ignored,
          status: spawnSync('git', ['check-ignore', '-q', ignored], { cwd: REPOSITORY }).status,
        }).toEqual({ ignored, status: 0 });
      }
      expect(
        files.filter((file) => /(^|\/)\.env(\.|$)/.test(path.basename(file)) && !file.endsWith('.example')),
      ).toEqual([]);
    });

    it('holds no secret: no assigned keys or passwords, no private keys, no cloud or chat tokens', () => {
      // Written in pieces so this file does not match itself.
      const patterns = [
        new RegExp(
          `^\\s*(export\\s+)?(JWT_SECRET|DB_PASSWORD|SMTP_PASSWORD|MARIADB_(ROOT_)?PASSWORD)=(?!\\.\\.\\.|\\$\\{|<)\\S`,
          'm',
        ),
        new RegExp(['-----BEGIN', '[A-Z ]*PRIVATE KEY-----'].join(' ')),
        new RegExp(['AKIA', '[0-9A-Z]{16}'].join('')),
        new RegExp(['xox[bap]-', '[0-9A-Za-z-]{10,}'].join('')),
        new RegExp(['gh[pousr]_', '[0-9A-Za-z]{30,}'].join('')),
      ];
      const leaks = files.flatMap((file) => {
        let text: string;
        try {
          text = readFileSync(path.join(REPOSITORY, file), 'utf8');
        } catch {
          return [];
        }
        return patterns
          .filter((pattern) => pattern.test(text))
          .map((pattern) => `${file}: ${pattern.source.slice(0, 30)}`);
      });
      expect(leaks).toEqual([]);
      expect(files.length).toBeGreaterThan(100);
    });
  });
});
