import { createHash } from 'node:crypto';
import { compareOvenLog } from '../../../src/annealing/compareOvenLog.ts';
import type { OvenLogTolerances } from '../../../src/annealing/OvenLogComparison.ts';
import { DomainError } from '../../../src/errors/DomainError.ts';
import type { Db } from '../../Db.ts';
import { ovenLogs } from '../../schema/index.ts';
import type { Actor } from '../Actor.ts';
import { getOvenLog } from './getOvenLog.ts';
import { getPlan } from './getPlan.ts';
import { getRun } from './getRun.ts';
import { insertOvenLogSamples } from './insertOvenLogSamples.ts';
import { ovenLogViewOf } from './OvenLogView.ts';
import { parseOvenLogCsv } from './parseOvenLogCsv.ts';

// A timestamped log that starts this far from the recorded run start is worth a note.
const START_MISMATCH_H = 0.25;

export interface OvenLogImport {
  body: Uint8Array;
  supersedesLogId?: string | undefined;
  reason?: string | undefined;
  tolerances?: Partial<OvenLogTolerances>;
}

/**
 * Imports a run's oven log, compares it with the run's plan and stores both, all or nothing.
 * A run has one current log; a second one must name the log it supersedes and say why.
 */
export async function importOvenLog(db: Db, actor: Actor, runId: string, input: OvenLogImport) {
  const parsed = parseOvenLogCsv(input.body);
  return db.transaction(async (tx) => {
    const run = await getRun(tx, actor, runId);
    if (run.supersededById) throw new DomainError('conflict', `Run ${runId} was amended by ${run.supersededById}; import the log against that run.`);
    if (input.supersedesLogId) {
      const previous = await getOvenLog(tx, actor, input.supersedesLogId);
      if (previous.runId !== runId) throw new DomainError('invalid_input', `Log ${previous.id} belongs to another run.`, [{ field: 'query.supersedesLogId', message: 'a log of this run' }]);
      if (previous.supersededById) throw new DomainError('conflict', `Log ${previous.id} was already superseded by ${previous.supersededById}.`, [{ field: 'query.supersedesLogId', message: `superseded by ${previous.supersededById}` }]);
    } else if (run.currentLog) {
      throw new DomainError('conflict', `Run ${runId} already has oven log ${run.currentLog.id}; to replace it, send supersedesLogId and a reason.`, [{ field: 'query.supersedesLogId', message: `the current log is ${run.currentLog.id}` }]);
    }
    const plan = await getPlan(tx, actor, run.planId);
    const samples = parsed.elapsedH.map((elapsedH, i) => ({ elapsedH, temperatureC: parsed.temperatureC[i]! }));
    const { elapsedH: _e, expectedC: _x, ...comparison } = compareOvenLog(plan.plan, samples, input.tolerances);
    const notes: string[] = [];
    const firstAt = parsed.observedAt[0];
    if (firstAt && Math.abs(firstAt.getTime() - run.startedAt.getTime()) > START_MISMATCH_H * 3_600_000) {
      notes.push(`The log starts at ${firstAt.toISOString()}, not at the run's recorded start ${run.startedAt.toISOString()}: it was compared from its own first sample.`);
    }
    if (parsed.ignoredColumns.length > 0) notes.push(`Columns not read: ${parsed.ignoredColumns.join(', ')}.`);
    const [row] = await tx
      .insert(ovenLogs)
      .values({
        labId: actor.labId,
        runId,
        timeColumn: parsed.timeColumn,
        sampleCount: comparison.sampleCount,
        durationH: parsed.elapsedH[parsed.elapsedH.length - 1]!,
        // reduce, not Math.min(...): spreading a long log overflows the call stack.
        minTemperatureC: parsed.temperatureC.reduce((a, b) => Math.min(a, b)),
        maxTemperatureC: parsed.temperatureC.reduce((a, b) => Math.max(a, b)),
        verdict: comparison.verdict,
        comparison: { ...comparison, notes } as unknown as Record<string, unknown>,
        bodySha256: createHash('sha256').update(input.body).digest('hex'),
        supersedesId: input.supersedesLogId,
        amendmentReason: input.reason,
        importedByKeyId: actor.keyId,
      })
      .returning();
    await insertOvenLogSamples(tx, actor, row!.id, parsed);
    return { ...ovenLogViewOf(row!, null), cautions: plan.cautions };
  });
}
