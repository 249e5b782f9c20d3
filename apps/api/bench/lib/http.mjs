// A small REST client for the benchmarks: JSON in, { status, body } out. It uses node:http with a
// keep-alive agent rather than fetch: the load generator shares the machine with the server, and
// fetch costs it about twice the CPU per request, which would be taken from the server being measured.
import { DEMO_PASSWORD } from '@catline/contracts';
import http from 'node:http';

const agent = new http.Agent({ keepAlive: true, maxSockets: 64 });

export function apiClient(baseUrl, token) {
  const call = (method, path, body) =>
    new Promise((resolve, reject) => {
      const payload = body === undefined ? undefined : JSON.stringify(body);
      const request = http.request(
        `${baseUrl}/api${path}`,
        {
          method,
          agent,
          headers: {
            ...(payload === undefined
              ? {}
              : { 'content-type': 'application/json', 'content-length': Buffer.byteLength(payload) }),
            ...(token ? { authorization: `Bearer ${token}` } : {}),
          },
        },
        (response) => {
          const chunks = [];
          response.on('data', (chunk) => chunks.push(chunk));
          response.on('end', () => {
            const text = Buffer.concat(chunks).toString('utf8');
            try {
              resolve({ status: response.statusCode, body: text ? JSON.parse(text) : null });
            } catch (error) {
              reject(error);
            }
          });
          response.on('error', reject);
        },
      );
      request.on('error', reject);
      request.end(payload);
    });
  return {
    get: (path) => call('GET', path),
    post: (path, body) => call('POST', path, body),
    patch: (path, body) => call('PATCH', path, body),
  };
}

export async function signIn(baseUrl, email, password = DEMO_PASSWORD) {
  const { status, body } = await apiClient(baseUrl).post('/auth/login', { email, password });
  if (status !== 200 && status !== 201)
    throw new Error(`Sign-in of ${email} failed: ${status} ${JSON.stringify(body)}`);
  return body.accessToken;
}

/** Throws with the server's message unless the status is 2xx. */
export function expectOk({ status, body }, what) {
  if (status < 200 || status >= 300)
    throw new Error(`${what} failed: ${status} ${body?.message ?? JSON.stringify(body)}`);
  return body;
}
