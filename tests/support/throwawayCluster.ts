import { execFileSync } from 'node:child_process';
import { chmodSync, mkdtempSync, readdirSync, rmSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

export interface ThrowawayCluster {
  url: string;
  start(): void;
  /** Fast shutdown: sessions are ended, as when the server restarts under a running service. */
  stop(): void;
  remove(): void;
}

const BIN = (() => {
  const versions = readdirSync('/usr/lib/postgresql').sort();
  return join('/usr/lib/postgresql', versions[versions.length - 1]!, 'bin');
})();

async function freePort(): Promise<number> {
  const server = createServer();
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  const port = (server.address() as { port: number }).port;
  await new Promise((resolve) => server.close(resolve));
  return port;
}

// PostgreSQL refuses to run as root, so its own tools run as the postgres user.
const asPostgres = (command: string) => execFileSync('su', ['postgres', '-c', command], { stdio: 'pipe' });

/** A PostgreSQL cluster of the test's own, in a temporary folder, on a spare loopback port. */
export async function throwawayCluster(): Promise<ThrowawayCluster> {
  const dir = mkdtempSync(join(tmpdir(), 'fl-cluster-'));
  chmodSync(dir, 0o777);
  const data = join(dir, 'data');
  const port = await freePort();
  asPostgres(`${BIN}/initdb -D ${data} -A trust -U postgres --no-sync >/dev/null`);
  const ctl = (args: string) => asPostgres(`${BIN}/pg_ctl -D ${data} -l ${dir}/server.log -w ${args}`);
  const cluster: ThrowawayCluster = {
    url: `postgres://postgres@127.0.0.1:${port}/postgres`,
    start: () => ctl(`-o "-c listen_addresses=127.0.0.1 -p ${port} -k ${dir} -c fsync=off" start`),
    stop: () => ctl('-m fast stop'),
    remove: () => {
      try {
        cluster.stop();
      } catch {
        // already stopped
      }
      rmSync(dir, { recursive: true, force: true });
    },
  };
  return cluster;
}
