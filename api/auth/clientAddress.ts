import type { Context } from 'hono';

/**
 * The peer address of the connection (the node server puts the socket in c.env). Forwarded
 * headers are not trusted: the service listens without a proxy in front by default. In-process
 * requests (tests) share one address.
 */
export function clientAddress(c: Context): string {
  const env = c.env as { incoming?: { socket?: { remoteAddress?: string } } } | undefined;
  return env?.incoming?.socket?.remoteAddress ?? 'in-process';
}
