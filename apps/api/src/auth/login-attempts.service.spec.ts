import type { ConfigService } from '@nestjs/config';
import type { Environment } from '../config/environment.js';
import { LOGIN_WINDOW_S, LoginAttempts } from './login-attempts.service.js';

const withLimit = (limit: number) =>
  new LoginAttempts({ get: () => limit } as unknown as ConfigService<Environment, true>);

describe('LoginAttempts', () => {
  it('allows the limit within a window and refuses the next with the wait left', async () => {
    const attempts = withLimit(3);
    for (let i = 0; i < 3; i += 1) await expect(attempts.record('ip|a@x')).resolves.toEqual({ allowed: true });
    const refused = await attempts.record('ip|a@x');
    expect(refused.allowed).toBe(false);
    expect(refused.allowed === false && refused.retryAfterS).toBeGreaterThan(LOGIN_WINDOW_S - 5);
  });

  it('counts each key on its own', async () => {
    const attempts = withLimit(1);
    await expect(attempts.record('ip|a@x')).resolves.toEqual({ allowed: true });
    await expect(attempts.record('ip|b@x')).resolves.toEqual({ allowed: true });
    await expect(attempts.record('ip|a@x')).resolves.toMatchObject({ allowed: false });
  });
});
