import { loadDemoScenario } from '../../seed/loadDemoScenario.ts';
import { addAnnealingRecords } from './archiveFixtures.ts';
import { archiveOf } from './archiveBytes.ts';
import { countRows } from './countRows.ts';
import { rolledBack } from './rolledBack.ts';
import { testDatabase } from './testDatabase.ts';

/**
 * The demo lab with annealing records, archived inside a transaction that is then rolled back,
 * so the archive's records exist nowhere and can be restored into the same database.
 */
export async function demoArchive() {
  const db = await testDatabase();
  return rolledBack(db, async (tx) => {
    const demo = await loadDemoScenario(tx);
    const { sharedGuidanceId } = await addAnnealingRecords(tx, demo.labId);
    return { bytes: await archiveOf(tx, demo.labId), labId: demo.labId, sharedGuidanceId, rowsInDemo: await countRows(tx) };
  });
}
