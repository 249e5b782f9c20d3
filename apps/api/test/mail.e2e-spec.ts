import { createHash } from 'node:crypto';
import type { INestApplication } from '@nestjs/common';
import request from 'supertest';
import { DataSource } from 'typeorm';
import { createUser, TEST_PASSWORD, unique } from './support/fleet-fixtures.js';
import { AIR_OPS, LineupDriver } from './support/lineup-fixtures.js';
import { MailCatcher } from './support/mail-catcher.js';
import { bearer, signIn } from './support/sign-in.js';

const APP_URL = 'http://catline.test:3000';
const NEW_PASSWORD = 'a brand new pass phrase';
const sha256 = (text: string) => createHash('sha256').update(text).digest('hex');

async function eventually<T>(read: () => Promise<T>, done: (value: T) => boolean, timeoutMs = 20_000): Promise<T> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const value = await read();
    if (done(value) || Date.now() > deadline) return value;
    await new Promise((resolve) => setTimeout(resolve, 200));
  }
}

function tokenIn(text: string, path: string): string {
  const match = new RegExp(`${APP_URL}${path}#token=([A-Za-z0-9_-]+)`).exec(text);
  if (!match) throw new Error(`No ${path} link in the mail:\n${text}`);
  return match[1];
}

describe('mail through the local mail catcher', () => {
  const settings = { SMTP_HOST: '127.0.0.1', SMTP_PORT: '', MAIL_SENDER: 'on', APP_URL };
  const saved = Object.fromEntries(Object.keys(settings).map((key) => [key, process.env[key]]));
  let catcher: MailCatcher;
  let app: INestApplication;
  let url: string;
  let admin: string;
  let database: DataSource;

  beforeAll(async () => {
    catcher = await MailCatcher.onFreePorts();
    await catcher.start();
    Object.assign(process.env, { ...settings, SMTP_PORT: String(catcher.smtpPort) });
    // Loaded only now: the app reads its configuration when its module is first imported.
    const { startTestApp } = await import('./support/test-app.js');
    ({ app, url } = await startTestApp());
    admin = await signIn(url, 'admin@catline.example');
    database = app.get(DataSource);
  });

  afterAll(async () => {
    await app?.close();
    await catcher?.stop();
    for (const [key, value] of Object.entries(saved)) {
      if (value === undefined) delete process.env[key];
      else process.env[key] = value;
    }
  });

  const login = (email: string, password: string) => request(url).post('/api/auth/login').send({ email, password });

  it('invites a person added without a password: the mailed link sets it once, and they sign in', async () => {
    const email = `${unique('invitee', 14).toLowerCase()}@catline.example`;
    const created = await request(url)
      .post('/api/users')
      .set(bearer(admin))
      .send({ email, name: 'Ines Invited', role: 'observer' });
    expect(created.status).toBe(201);

    const [mail] = await catcher.mailsTo(email);
    expect(mail.subject).toBe('Your Catline account: choose a password');
    expect(mail.text).toContain('Hello Ines Invited,');
    const token = tokenIn(mail.text, '/invitation');
    const stored = await database.query<{ token_hash: string }[]>(
      'SELECT token_hash FROM password_links WHERE user_id = ?',
      [created.body.id],
    );
    expect(stored).toEqual([{ token_hash: sha256(token) }]);
    expect((await login(email, NEW_PASSWORD)).status).toBe(401);

    const accepted = await request(url).post('/api/auth/invitations/accept').send({ token, newPassword: NEW_PASSWORD });
    expect(accepted.status).toBe(204);
    const session = await login(email, NEW_PASSWORD);
    expect(session.status).toBe(200);
    expect(session.body.user).toMatchObject({ email, role: 'observer' });

    const reused = await request(url)
      .post('/api/auth/invitations/accept')
      .send({ token, newPassword: 'yet another pass phrase' });
    expect(reused.status).toBe(400);
    expect(reused.body.code).toBe('link_invalid');
    expect((await login(email, NEW_PASSWORD)).status).toBe(200);
  });

  it('sends a new invitation on request, after which the earlier link no longer works', async () => {
    const email = `${unique('reinvite', 14).toLowerCase()}@catline.example`;
    const created = await request(url)
      .post('/api/users')
      .set(bearer(admin))
      .send({ email, name: 'Rafe Reinvited', role: 'pilot', squadronId: 1 });
    const first = tokenIn((await catcher.mailsTo(email))[0].text, '/invitation');
    const again = await request(url).post(`/api/users/${created.body.id}/invitation`).set(bearer(admin));
    expect(again.status).toBe(202);
    const mails = await catcher.mailsTo(email, 2);
    expect(mails).toHaveLength(2);
    const second = mails.map((mail) => tokenIn(mail.text, '/invitation')).find((token) => token !== first)!;

    expect(
      (await request(url).post('/api/auth/invitations/accept').send({ token: first, newPassword: NEW_PASSWORD }))
        .status,
    ).toBe(400);
    expect(
      (await request(url).post('/api/auth/invitations/accept').send({ token: second, newPassword: NEW_PASSWORD }))
        .status,
    ).toBe(204);
    const refused = await request(url).post(`/api/users/${created.body.id}/invitation`).set(bearer(admin));
    expect(refused.status).toBe(409);
    expect(refused.body.code).toBe('cannot_invite');
  });

  it('answers a reset request the same for any e-mail and mails a one-time link to a known one', async () => {
    const person = await createUser(url, admin, 'handler');
    const unknown = await request(url).post('/api/auth/password-reset').send({ email: 'nobody-here@catline.example' });
    const known = await request(url).post('/api/auth/password-reset').send({ email: person.email.toUpperCase() });
    expect(known.status).toBe(202);
    expect(known.body).toEqual(unknown.body);
    expect(unknown.status).toBe(202);

    const [mail] = await catcher.mailsTo(person.email);
    expect(mail.subject).toBe('Catline: set a new password');
    const token = tokenIn(mail.text, '/reset-password');
    // A second request within the minute queues no second mail.
    await request(url).post('/api/auth/password-reset').send({ email: person.email });
    const wrongRoute = await request(url)
      .post('/api/auth/invitations/accept')
      .send({ token, newPassword: NEW_PASSWORD });
    expect(wrongRoute.body.code).toBe('link_invalid');
    const short = await request(url).post('/api/auth/password-reset/confirm').send({ token, newPassword: 'short' });
    expect(short.status).toBe(400);

    const confirmed = await request(url)
      .post('/api/auth/password-reset/confirm')
      .send({ token, newPassword: NEW_PASSWORD });
    expect(confirmed.status).toBe(204);
    expect((await login(person.email, TEST_PASSWORD)).status).toBe(401);
    expect((await login(person.email, NEW_PASSWORD)).status).toBe(200);
    expect(
      (await request(url).post('/api/auth/password-reset/confirm').send({ token, newPassword: 'one more pass phrase' }))
        .status,
    ).toBe(400);
    await expect(catcher.mailsTo(person.email, 2, 2_500)).resolves.toHaveLength(1);
  });

  it('keeps the cycle summaries through a mail server outage and sends each squadron exactly one', async () => {
    const driver = new LineupDriver(url);
    const cycle = await driver.createCycle();
    await driver.addSlot(cycle.id, 'C27');
    await driver.addSlot(cycle.id, 'D39');
    await catcher.stop();

    const { version } = await driver.snapshot(cycle.id);
    await driver.ok(AIR_OPS, 'post', `/api/cycles/${cycle.id}/close`, { basisVersion: version });
    const summaries = () =>
      database.query<{ to_address: string; attempts: number; sent_at: Date | null; last_error: string | null }[]>(
        'SELECT to_address, attempts, sent_at, last_error FROM mail_outbox WHERE dedupe_key LIKE ? ORDER BY to_address',
        [`cycle-summary:${cycle.id}:%`],
      );
    const failed = await eventually(
      summaries,
      (rows) => rows.length === 2 && rows.every((row) => row.attempts >= 1 && row.last_error !== null),
    );
    expect(
      failed.map((row) => ({ to: row.to_address, sent: row.sent_at !== null, failedOnce: row.last_error !== null })),
    ).toEqual([
      { to: 'cinderwrights@catline.example', sent: false, failedOnce: true },
      { to: 'driftmenders@catline.example', sent: false, failedOnce: true },
    ]);

    await catcher.start();
    const sent = await eventually(summaries, (rows) => rows.every((row) => row.sent_at !== null));
    expect(sent.every((row) => row.sent_at !== null && row.last_error === null)).toBe(true);
    // A few more rounds of the sender: nothing goes out twice.
    await new Promise((resolve) => setTimeout(resolve, 2_500));
    const caught = (await catcher.mails()).filter((mail) => mail.subject.startsWith(`Cycle ${cycle.number} closed:`));
    expect(caught.map((mail) => mail.to[0].address).sort()).toEqual([
      'cinderwrights@catline.example',
      'driftmenders@catline.example',
    ]);
    expect(caught.find((mail) => mail.to[0].address === 'cinderwrights@catline.example')!.text).toContain(
      'C27  WKD-41  Strike training',
    );
  });
});
