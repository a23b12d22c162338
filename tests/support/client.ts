import type { createApp } from '../../api/createApp.ts';

export interface Reply {
  status: number;
  headers: Headers;
  // Tests read arbitrary JSON answers; the route schemas are checked by the assertions.
  // eslint-disable-next-line @typescript-eslint/no-explicit-any
  body: any;
  text: string;
}

export interface Client {
  get(path: string): Promise<Reply>;
  post(path: string, body?: unknown, headers?: Record<string, string>): Promise<Reply>;
  send(method: string, path: string, init?: { body?: BodyInit; headers?: Record<string, string> }): Promise<Reply>;
}

/** A Client over any request function: in-process (app.request) or real HTTP (fetch). */
export function clientOver(request: (path: string, init: RequestInit) => Response | Promise<Response>, key: string | undefined): Client {
  const send: Client['send'] = async (method, path, init = {}) => {
    const headers: Record<string, string> = { ...(key ? { authorization: `Bearer ${key}` } : {}), ...init.headers };
    const withBody = init.body !== undefined && method !== 'GET' && method !== 'HEAD';
    const res = await request(path, { method, headers, ...(withBody ? { body: init.body } : {}) });
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

/** In-process requests through app.request, authenticated with one key (or none). */
export function clientFor(app: ReturnType<typeof createApp>, key: string | undefined): Client {
  return clientOver((path, init) => app.request(path, init), key);
}
