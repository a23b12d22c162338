import { and, asc, desc, eq, sql } from 'drizzle-orm';
import { DomainError } from '../../../src/errors/DomainError.ts';
import type { Db } from '../../Db.ts';
import { annealingPlans, annealingRunModels, annealingRuns, models, ovenLogs } from '../../schema/index.ts';
import type { Actor } from '../Actor.ts';

/** A run with its load, the plan it followed and its current oven log, if one was imported. */
export async function getRun(db: Db, actor: Actor, id: string) {
  const r = annealingRuns;
  const [row] = await db
    .select({ run: r, plan: { id: annealingPlans.id, guidanceKey: annealingPlans.guidanceKey, catalogueVersion: annealingPlans.catalogueVersion, totalDurationH: annealingPlans.totalDurationH, maxTemperatureC: annealingPlans.maxTemperatureC, plan: annealingPlans.plan } })
    .from(r)
    .innerJoin(annealingPlans, eq(annealingPlans.id, r.planId))
    .where(and(eq(r.id, id), eq(r.labId, actor.labId)));
  if (!row) throw new DomainError('not_found', `No annealing run ${id} in this lab.`);
  const [successor] = await db.select({ id: r.id }).from(r).where(eq(r.supersedesId, id));
  const load = await db
    .select({ id: models.id, code: models.code, thicknessMm: models.thicknessMm })
    .from(annealingRunModels)
    .innerJoin(models, eq(models.id, annealingRunModels.modelId))
    .where(eq(annealingRunModels.runId, id))
    .orderBy(asc(models.code));
  const l = ovenLogs;
  // The outer table is named in full: drizzle leaves columns of a one-table select unqualified,
  // and inside the subquery a bare "id" would be the subquery's own.
  const [log] = await db
    .select({ id: l.id, verdict: l.verdict, sampleCount: l.sampleCount, importedAt: l.importedAt, reasons: sql<string[]>`${l.comparison}->'reasons'` })
    .from(l)
    .where(and(eq(l.runId, id), sql`not exists (select 1 from oven_logs s where s.supersedes_id = oven_logs.id)`))
    .orderBy(desc(l.importedAt))
    .limit(1);
  const { plan: planJson, ...plan } = row.plan;
  const cautions = (planJson as { cautions?: string[] }).cautions ?? [];
  const endsAt = new Date(row.run.startedAt.getTime() + plan.totalDurationH * 3_600_000);
  return { ...row.run, plannedEndAt: endsAt, supersededById: successor?.id ?? null, plan, models: load, currentLog: log ?? null, cautions };
}

export type RunView = Awaited<ReturnType<typeof getRun>>;
