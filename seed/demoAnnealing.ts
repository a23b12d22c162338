import { and, eq } from 'drizzle-orm';
import type { AnnealingPlan } from '../src/annealing/AnnealingPlan.ts';
import { plannedTemperatures } from '../src/annealing/plannedTemperatures.ts';
import type { Db } from '../db/Db.ts';
import type { Actor } from '../db/operations/Actor.ts';
import { createGuidanceEntry } from '../db/operations/annealing/createGuidanceEntry.ts';
import { generateModelPlan } from '../db/operations/annealing/generateModelPlan.ts';
import { importOvenLog } from '../db/operations/annealing/importOvenLog.ts';
import { recordRun } from '../db/operations/annealing/recordRun.ts';
import { setHouseCycle } from '../db/operations/annealing/setHouseCycle.ts';
import { models } from '../db/schema/index.ts';
import { DEMO_MODELS } from './demoScenario.ts';

const HOUR_MS = 3_600_000;
const DEMO_MODEL = 'SN-B1';
/** Hours after machining: SN-B1 is read before annealing at 4 h and after it at 60 h. */
const RUN_STARTS_AT_H = 5;
const LOG_STEP_H = 2 / 60;

// The demo lab's own cycle; every number is invented for the demonstration. It is shorter than
// the published polycarbonate cycles, so the run fits between SN-B1's two anneal readings.
const notebook = { document: 'Demo lab annealing notebook (invented for the demonstration)', locator: 'polycarbonate house practice', flag: 'common_practice' as const };
const DEMO_HOUSE_CYCLE = {
  key: 'polycarbonate-sheet.demo-lab-132',
  title: 'Polycarbonate sheet: demo lab house cycle, 132 °C soak',
  materialFamily: 'polycarbonate',
  heating: [],
  heatingRateToSoak: { kind: 'fixed', rateCPerH: { value: 18, source: notebook } },
  soak: { temperature: { kind: 'absolute', temperatureC: { value: 132, source: notebook } }, time: { hoursPerMm: { value: 0.6, source: notebook }, minimumH: { value: 3, source: notebook } } },
  cooling: [{ rate: { kind: 'fixed', rateCPerH: { value: 4.5, source: notebook } }, to: { kind: 'absolute', temperatureC: { value: 38, source: notebook } } }],
  thermalDiffusivityMm2PerS: { value: 0.144, source: { document: 'k/(ρ·cp) of the catalogue polycarbonate', locator: 'material record', flag: 'derived' as const } },
  allowedGradientC: { value: 2, source: notebook },
};

/**
 * An invented controller log that keeps to the plan: the planned curve with a slow wobble of
 * 0.15 °C (about 0.7 °C/h at most, far inside the soak's rate allowance) and 0.1 °C rounding,
 * timestamped every 2 minutes from the run's start.
 */
function demoOvenLog(plan: AnnealingPlan, startMs: number): string {
  const times: number[] = [];
  for (let t = 0; t <= plan.totalDurationH + 0.5; t += LOG_STEP_H) times.push(t);
  const planned = plannedTemperatures(plan.segments, times);
  const rows = times.map((t, i) => {
    const c = (planned[i] ?? plan.segments.at(-1)!.endTemperatureC) + 0.15 * Math.sin((2 * Math.PI * t) / 1.3);
    return `${new Date(startMs + t * HOUR_MS).toISOString()},${c.toFixed(1)}`;
  });
  return ['timestamp,temperature_c,set_point_c', ...rows.map((r, i) => `${r},${(planned[i] ?? 0).toFixed(1)}`)].join('\n') + '\n';
}

/**
 * One completed anneal in the demo lab: the lab's house cycle for polycarbonate, a plan for
 * SN-B1 from it, the run in an oven with SN-B1 in the load, and a conforming oven log.
 */
export async function loadDemoAnnealing(db: Db, actor: Actor, now: number): Promise<void> {
  const spec = DEMO_MODELS.find((m) => m.code === DEMO_MODEL)!;
  const [model] = await db.select().from(models).where(and(eq(models.labId, actor.labId), eq(models.code, DEMO_MODEL)));
  const entry = await createGuidanceEntry(db, actor, { entry: DEMO_HOUSE_CYCLE });
  await setHouseCycle(db, actor, { materialFamily: 'polycarbonate', guidanceEntryId: entry.id, reason: 'Same relief as the published cycle in the lab trials, in about half the oven time.' });
  const plan = await generateModelPlan(db, actor, model!.id, {});
  const startMs = now - spec.machinedDaysAgo * 24 * HOUR_MS + RUN_STARTS_AT_H * HOUR_MS;
  const run = await recordRun(db, actor, { planId: plan.id, ovenName: 'Oven 2 (forced air)', modelIds: [model!.id], operator: 'T. Haddad', startedAt: new Date(startMs).toISOString(), notes: 'SN-B1 on a flat glass plate, mid shelf.' });
  await importOvenLog(db, actor, run.id, { body: new TextEncoder().encode(demoOvenLog(plan.plan, startMs)) });
}
