import { type AuditEntryView, DEMO_PASSWORD, type Page } from '@catline/contracts';
import request from 'supertest';
import { ApiProcess, apiSettings, type ApiSettings } from './reliability/support/api-process.js';
import { ADMIN } from './support/lineup-fixtures.js';
import { bearer, demoEmail, signIn } from './support/sign-in.js';

// Ship networks often serve the app over plain HTTP inside, sometimes behind a TLS-terminating proxy.
// What the browser is told must work in both cases. The settings are read once at boot, so each case
// starts the built API as its own process.

let settings: ApiSettings;
/** For a test that starts two API processes one after the other: on a loaded machine each may take a minute. */
const TWO_STARTS_MS = 180_000;

beforeAll(async () => {
  settings = await apiSettings('plain_http');
});

async function withApp(overrides: Record<string, string>, check: (url: string) => Promise<void>): Promise<void> {
  const api = await ApiProcess.start({ ...settings, env: { ...settings.env, ...overrides } });
  try {
    await check(settings.url);
  } finally {
    await api.stop();
  }
}

const login = (url: string) =>
  request(url)
    .post('/api/auth/login')
    .send({ email: demoEmail('observer'), password: DEMO_PASSWORD });

/** The client address the audit trail recorded for the observer's latest sign-in. */
async function lastSignInAddress(url: string): Promise<string | null> {
  const response = await request(url)
    .get('/api/audit')
    .query({ action: 'sign_in.succeeded', actor: demoEmail('observer'), limit: 1 })
    .set(bearer(await signIn(url, ADMIN)));
  expect(response.status).toBe(200);
  return (response.body as Page<AuditEntryView>).items[0].clientAddress;
}

const refreshCookie = (response: request.Response) =>
  ([] as string[]).concat(response.headers['set-cookie'] ?? []).find((cookie) => cookie.startsWith('catline_refresh='));

describe('served over plain HTTP or behind a TLS proxy', () => {
  it('over plain HTTP, nothing tells the browser to switch to HTTPS', async () => {
    await withApp({ APP_URL: 'http://catline.ship.test:3000' }, async (url) => {
      for (const path of ['/', '/api/health', '/api/nowhere']) {
        const response = await request(url).get(path);
        const policy = response.headers['content-security-policy'] as string;
        expect(policy).toContain("default-src 'self'");
        expect(policy).not.toContain('upgrade-insecure-requests');
        expect(response.headers['strict-transport-security']).toBeUndefined();
      }
      const cookie = refreshCookie(await login(url));
      expect(cookie).toBeDefined();
      expect(cookie).not.toMatch(/;\s*Secure/i);
    });
  });

  it('with a public HTTPS address, the browser is told to stay on HTTPS', async () => {
    await withApp({ APP_URL: 'https://catline.ship.test' }, async (url) => {
      const response = await request(url).get('/api/health');
      expect(response.headers['content-security-policy']).toContain('upgrade-insecure-requests');
      expect(response.headers['strict-transport-security']).toMatch(/max-age=\d+/);
    });
  });

  it(
    'behind a trusted TLS proxy, the refresh cookie is Secure; an untrusted X-Forwarded-Proto changes nothing',
    async () => {
      await withApp({ APP_URL: 'https://catline.ship.test', TRUST_PROXY: 'loopback' }, async (url) => {
        const cookie = refreshCookie(await login(url).set('X-Forwarded-Proto', 'https'));
        expect(cookie).toMatch(/;\s*Secure/i);
      });
      await withApp({ APP_URL: 'https://catline.ship.test' }, async (url) => {
        const cookie = refreshCookie(await login(url).set('X-Forwarded-Proto', 'https'));
        expect(cookie).toBeDefined();
        expect(cookie).not.toMatch(/;\s*Secure/i);
      });
    },
    TWO_STARTS_MS,
  );

  // 203.0.113.7 is a documentation address (RFC 5737): it only travels as a header value, nothing is sent to it.
  it(
    'behind a trusted proxy, the forwarded client address is recorded; without TRUST_PROXY the header is ignored',
    async () => {
      await withApp({ TRUST_PROXY: 'loopback' }, async (url) => {
        await login(url).set('X-Forwarded-For', '203.0.113.7').expect(200);
        expect(await lastSignInAddress(url)).toBe('203.0.113.7');
      });
      await withApp({}, async (url) => {
        await login(url).set('X-Forwarded-For', '203.0.113.7').expect(200);
        expect(await lastSignInAddress(url)).toMatch(/127\.0\.0\.1$/);
      });
    },
    TWO_STARTS_MS,
  );
});
