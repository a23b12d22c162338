import { type Client, clientOver } from './client.ts';

/** The tests' Client over real HTTP, for a service running in another process. */
export function httpClient(baseUrl: string, key: string | undefined): Client {
  return clientOver((path, init) => fetch(baseUrl + path, init), key);
}
