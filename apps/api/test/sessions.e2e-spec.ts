import type { INestApplication } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { getDataSourceToken } from '@nestjs/typeorm';
import request from 'supertest';
import type { DataSource } from 'typeorm';
import { User } from '../src/database/entities/user.entity.js';
import { refreshCookie } from './support/cookies.js';
import { TEST_PASSWORD, createUser } from './support/fleet-fixtures.js';
import { ADMIN, LineupDriver } from './support/lineup-fixtures.js';
import { bearer, signIn } from './support/sign-in.js';
import { type ClientSocket, connected, eventually, join, openSocket } from './support/socket-client.js';
import { startTestApp } from './support/test-app.js';

describe('sessions end at once: the access token and the open sockets', () => {
  let app: INestApplication;
  let url: string;
  let origin: string;
  let admin: string;
  let deck: LineupDriver;
  let cycleId: number;
  const sockets: ClientSocket[] = [];

  beforeAll(async () => {
    ({ app, url } = await startTestApp());
    origin = app.get(ConfigService).get<string>('WEB_ORIGINS')!.split(',')[0].trim();
    admin = await signIn(url, ADMIN);
    deck = new LineupDriver(url);
    cycleId = (await deck.createCycle()).id;
  });

  afterEach(() => {
    for (const socket of sockets.splice(0)) socket.disconnect();
  });

  afterAll(async () => {
    await app.close();
  });

  const me = (token: string) => request(url).get('/api/auth/me').set(bearer(token));

  async function signedIn() {
    const person = await createUser(url, admin, 'observer');
    const response = await request(url).post('/api/auth/login').send({ email: person.email, password: TEST_PASSWORD });
    return { person, token: response.body.accessToken as string, cookie: refreshCookie(response) };
  }

  /** A socket in the cycle's room, and whether the server has since disconnected it. */
  async function following(token: string) {
    const socket = openSocket(url, { token, origin });
    sockets.push(socket);
    await connected(socket);
    expect((await join(socket, { cycleId })).ok).toBe(true);
    const state = { ended: false, told: false };
    socket.on('disconnect', () => (state.ended = true));
    socket.on('session:expired', () => (state.told = true));
    return { socket, state };
  }

  it('logout ends the access token of that session, not the other sessions of the person', async () => {
    const { person, token, cookie } = await signedIn();
    const other = await signIn(url, person.email, TEST_PASSWORD);
    const live = await following(token);

    const out = await request(url).post('/api/auth/logout').set(bearer(token)).set('Cookie', cookie);
    expect(out.status).toBe(204);

    expect((await me(token)).status).toBe(401);
    await eventually(() => live.state.ended, 2_000, 'the logged-out socket to be disconnected');
    expect((await me(other)).status).toBe(200);
  });

  it('removing a person disconnects their socket at once and refuses their token', async () => {
    const { person, token } = await signedIn();
    const live = await following(token);

    expect((await request(url).delete(`/api/users/${person.id}`).set(bearer(admin))).status).toBe(204);

    await eventually(() => live.state.ended, 2_000, "the removed person's socket to be disconnected");
    expect(live.state.told).toBe(true);
    expect((await me(token)).status).toBe(401);
  });

  it('a role change and a password change disconnect every socket of the person', async () => {
    const roleChanged = await signedIn();
    const roleSocket = await following(roleChanged.token);
    const patched = await request(url)
      .patch(`/api/users/${roleChanged.person.id}`)
      .set(bearer(admin))
      .send({ role: 'handler' });
    expect(patched.status).toBe(200);
    await eventually(() => roleSocket.state.ended, 2_000, 'the socket to be disconnected after the role change');

    const passwordChanged = await signedIn();
    const here = await following(passwordChanged.token);
    const elsewhere = await following(await signIn(url, passwordChanged.person.email, TEST_PASSWORD));
    const changed = await request(url)
      .post('/api/auth/password')
      .set(bearer(passwordChanged.token))
      .send({ currentPassword: TEST_PASSWORD, newPassword: 'a different long passphrase' });
    expect(changed.status).toBe(204);
    await eventually(() => here.state.ended && elsewhere.state.ended, 2_000, 'both sockets to be disconnected');
  });

  it('checks the person again on every socket event: cycle:join is refused once their tokens are withdrawn', async () => {
    const { person, token } = await signedIn();
    const { socket } = await following(token);
    // Withdrawn behind the app's back (as another process would), so no disconnect is sent: the event check alone must refuse.
    await app.get<DataSource>(getDataSourceToken()).getRepository(User).increment({ id: person.id }, 'tokenVersion', 1);

    const refused = await join(socket, { cycleId });
    expect(refused).toMatchObject({ ok: false, code: 'session_invalid' });
  });
});
