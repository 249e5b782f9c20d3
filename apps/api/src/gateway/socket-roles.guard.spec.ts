import type { Role } from '@catline/contracts';
import { Reflector } from '@nestjs/core';
import { ExecutionContextHost } from '@nestjs/core/helpers/execution-context-host.js';
import type { TokenVerifier } from '../auth/token-verifier.service.js';
import type { AuthenticatedUser } from '../common/authenticated-user.js';
import { Roles } from '../common/decorators/roles.decorator.js';
import { SocketRolesGuard } from './socket-roles.guard.js';

// Every event of today's gateway is open to every role, so the integration matrix cannot reach the
// refusal by role; these events exist only to drive it.
class EventsForTest {
  @Roles('air_operations', 'handler')
  planning(): void {}

  unmarked(): void {}
}

const HOUR_MS = 3_600_000;

/** The role the person has now (the verifier's answer), or a session the verifier refuses. */
async function attempt(
  handler: keyof EventsForTest,
  role: Role | 'ended',
  expiresAt = new Date(Date.now() + HOUR_MS),
): Promise<unknown> {
  const user = { id: 7, email: 'someone@example.test', name: 'Someone', role, catapultId: null } as AuthenticatedUser;
  const verifier = {
    recheck: async () => {
      if (role === 'ended') throw new Error('session ended');
      return user;
    },
  } as unknown as TokenVerifier;
  const claims = { sub: 7, tv: 0, sid: 'a-session' };
  const context = new ExecutionContextHost(
    [{ data: { user: { ...user, role: 'admin' }, claims, expiresAt } }, {}],
    EventsForTest,
    EventsForTest.prototype[handler],
  );
  context.setType('ws');
  try {
    return await new SocketRolesGuard(new Reflector(), verifier).canActivate(context);
  } catch (refusal) {
    return (refusal as { getError(): unknown }).getError();
  }
}

describe('SocketRolesGuard', () => {
  it('lets a role the event names through', async () => {
    expect(await attempt('planning', 'handler')).toBe(true);
  });

  it('refuses a role the event does not name, with the code and the role in the sentence', async () => {
    expect(await attempt('planning', 'pilot')).toEqual({ code: 'forbidden_role', message: 'Pilot may not do this.' });
  });

  it('refuses every role on an event that names none', async () => {
    expect(await attempt('unmarked', 'admin')).toEqual({ code: 'forbidden_role', message: 'Admin may not do this.' });
  });

  it('refuses a session that has run out before looking at the role', async () => {
    expect(await attempt('planning', 'handler', new Date(Date.now() - 1))).toMatchObject({ code: 'session_invalid' });
  });

  it('refuses a session the verifier no longer accepts (ended, person removed, tokens withdrawn)', async () => {
    expect(await attempt('planning', 'ended')).toMatchObject({ code: 'session_invalid' });
  });
});
