import type { Role } from '@catline/contracts';
import { Reflector } from '@nestjs/core';
import { ExecutionContextHost } from '@nestjs/core/helpers/execution-context-host.js';
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

function attempt(handler: keyof EventsForTest, role: Role, expiresAt = new Date(Date.now() + HOUR_MS)): unknown {
  const user = { id: 7, email: 'someone@example.test', name: 'Someone', role, catapultId: null } as AuthenticatedUser;
  const context = new ExecutionContextHost(
    [{ data: { user, expiresAt } }, {}],
    EventsForTest,
    EventsForTest.prototype[handler],
  );
  context.setType('ws');
  try {
    return new SocketRolesGuard(new Reflector()).canActivate(context);
  } catch (refusal) {
    return (refusal as { getError(): unknown }).getError();
  }
}

describe('SocketRolesGuard', () => {
  it('lets a role the event names through', () => {
    expect(attempt('planning', 'handler')).toBe(true);
  });

  it('refuses a role the event does not name, with the code and the role in the sentence', () => {
    expect(attempt('planning', 'pilot')).toEqual({ code: 'forbidden_role', message: 'Pilot may not do this.' });
  });

  it('refuses every role on an event that names none', () => {
    expect(attempt('unmarked', 'admin')).toEqual({ code: 'forbidden_role', message: 'Admin may not do this.' });
  });

  it('refuses a session that has run out before looking at the role', () => {
    expect(attempt('planning', 'handler', new Date(Date.now() - 1))).toMatchObject({ code: 'session_invalid' });
  });
});
