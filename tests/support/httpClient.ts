import type { Client } from './client.ts';

/** The tests' Client over real HTTP, for a service running in another process. */
export function httpClient(baseUrl: string, key: string | undefined): Client {
  const send: Client['send'] = async (method, path, init = {}) => {
    const headers: Record<string, string> = { ...(key ? { authorization: `Bearer ${key}` } : {}), ...init.headers };
    const withBody = init.body !== undefined && method !== 'GET' && method !== 'HEAD';
    const res = await fetch(baseUrl + path, { method, headers, ...(withBody ? { body: init.body } : {}) });
    const text = await res.text();
    let body: unknown;
    try {
      body = text ? JSON.parse(text) : undefined;
    } catch {
      body = undefined;
    }
    return { status: res.status, headers: res.headers, body, text };
  };
  return {
    send,
    get: (path) => send('GET', path),
    post: (path, body, headers = {}) =>
      send('POST', path, body === undefined ? { headers } : { body: JSON.stringify(body), headers: { 'content-type': 'application/json', ...headers } }),
  };
}
