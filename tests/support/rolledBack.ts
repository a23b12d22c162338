import type { Db } from '../../db/Db.ts';

class RollBack extends Error {}

/** Runs work in a transaction that is always rolled back, and returns the work's result. */
export async function rolledBack<T>(db: Db, work: (tx: Db) => Promise<T>): Promise<T> {
  let result: T | undefined;
  try {
    await db.transaction(async (tx) => {
      result = await work(tx);
      throw new RollBack();
    });
  } catch (error) {
    if (!(error instanceof RollBack)) throw error;
  }
  return result as T;
}
