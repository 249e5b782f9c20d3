// A small REST client for the benchmarks: JSON in, { status, body } out.
export function apiClient(baseUrl, token) {
  const call = async (method, path, body) => {
    const response = await fetch(`${baseUrl}/api${path}`, {
      method,
      headers: { 'content-type': 'application/json', ...(token ? { authorization: `Bearer ${token}` } : {}) },
      body: body === undefined ? undefined : JSON.stringify(body),
    });
    const text = await response.text();
    return { status: response.status, body: text ? JSON.parse(text) : null };
  };
  return {
    get: (path) => call('GET', path),
    post: (path, body) => call('POST', path, body),
    patch: (path, body) => call('PATCH', path, body),
  };
}

export async function signIn(baseUrl, email, password = 'catline-demo') {
  const { status, body } = await apiClient(baseUrl).post('/auth/login', { email, password });
  if (status !== 200 && status !== 201) throw new Error(`Sign-in of ${email} failed: ${status} ${JSON.stringify(body)}`);
  return body.accessToken;
}

/** Throws with the server's message unless the status is 2xx. */
export function expectOk({ status, body }, what) {
  if (status < 200 || status >= 300) throw new Error(`${what} failed: ${status} ${body?.message ?? JSON.stringify(body)}`);
  return body;
}
