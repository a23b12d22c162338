import type { Db } from '../../db/Db.ts';
import { createLab } from '../../db/operations/createLab.ts';
import { createApiKey } from '../../db/operations/keys/createApiKey.ts';
import { createApp } from '../../api/createApp.ts';
import { type AppConfig, defaultConfig } from '../../api/env.ts';
import { testDatabase } from './testDatabase.ts';
import { type Client, clientFor } from './client.ts';
import { type Factories, factoriesFor } from './factories.ts';

class RollBackTest extends Error {}

export interface LabContext {
  db: Db;
  app: ReturnType<typeof createApp>;
  labId: string;
  keys: { admin: string; technician: string; viewer: string };
  admin: Client;
  technician: Client;
  viewer: Client;
  anonymous: Client;
  make: Factories;
  /** A second lab in the same transaction, for isolation tests. */
  otherLab(): Promise<{ labId: string; admin: Client }>;
}

let labCounter = 0;

/**
 * Runs a test inside one transaction that is always rolled back, with a fresh lab, a key per
 * role, and the app wired to that transaction, so tests never see each other's rows. `config`
 * overrides settings such as body limits for the tests that probe them.
 */
export async function inLab(test: (lab: LabContext) => Promise<void>, config: Partial<AppConfig> = {}): Promise<void> {
  const db = await testDatabase();
  try {
    await db.transaction(async (tx) => {
      const app = createApp({ db: tx, config: defaultConfig(config) });
      const lab = await createLab(tx, `test lab ${process.pid}-${++labCounter}`);
      const technician = await createApiKey(tx, lab.labId, { label: 'technician', role: 'technician' });
      const viewer = await createApiKey(tx, lab.labId, { label: 'viewer', role: 'viewer' });
      const keys = { admin: lab.adminKey.secret, technician: technician.secret, viewer: viewer.secret };
      const admin = clientFor(app, keys.admin);
      await test({
        db: tx,
        app,
        labId: lab.labId,
        keys,
        admin,
        technician: clientFor(app, keys.technician),
        viewer: clientFor(app, keys.viewer),
        anonymous: clientFor(app, undefined),
        make: factoriesFor(admin),
        otherLab: async () => {
          const other = await createLab(tx, `other lab ${process.pid}-${++labCounter}`);
          return { labId: other.labId, admin: clientFor(app, other.adminKey.secret) };
        },
      });
      throw new RollBackTest();
    });
  } catch (error) {
    if (!(error instanceof RollBackTest)) throw error;
  }
}
