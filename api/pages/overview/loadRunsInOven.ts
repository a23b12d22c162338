import { listRunsInPlay, type RunInPlay } from '../../../db/operations/annealing/listRunsInPlay.ts';
import type { Actor } from '../../../db/operations/Actor.ts';
import type { Db } from '../../../db/Db.ts';

const DAY_MS = 86_400_000;
// No schedule of this trade runs longer than a few weeks; older runs cannot still be in the oven.
const LOOK_BACK_DAYS = 45;
const MAX_RUNS_SHOWN = 20;

export type RunInOven = RunInPlay;

/** The runs the overview lists: not started, in the oven, or over with no oven log yet. */
export function loadRunsInOven(db: Db, actor: Actor, now: Date): Promise<RunInOven[]> {
  return listRunsInPlay(db, actor, { now, since: new Date(now.getTime() - LOOK_BACK_DAYS * DAY_MS), limit: MAX_RUNS_SHOWN });
}
