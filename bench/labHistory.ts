import { randomUUID } from 'node:crypto';

/** An invented lab history large enough to stress the trend queries; deterministic per random start. */
export interface HistoryPlan {
  batches: number;
  modelsPerBatch: number;
  /** Every site gets this many readings. */
  readingsPerSite: number;
  randomStart: number;
}

export interface BenchModel {
  id: string;
  code: string;
  batchIndex: number;
  geometryKind: string;
  thicknessMm: number;
  machiningMethod: string;
  machinedMs: number;
  stillStored: boolean;
}

export interface BenchSite {
  id: string;
  model: BenchModel;
  label: string;
  kind: 'notch_root' | 'machined_edge' | 'interior';
  onFreeEdge: boolean;
}

export interface BenchReading {
  site: BenchSite;
  stage: string;
  loadN: number | null;
  observedMs: number;
  operator: string;
  fringeOrder: number;
}

const HOUR_MS = 3_600_000;
const START_MS = Date.parse('2024-01-08T08:00:00Z');
const SPAN_H = 2 * 365 * 24;
const GEOMETRIES = ['opposite_rounded_notches', 'opposite_sharp_sawn_notches', 'tension_strip'];
const METHODS = ['milling', 'fly cutting', 'band sawing', 'abrasive water-jet cutting'];
const OPERATORS = ['A. Ahn', 'B. Berg', 'C. Cruz', 'D. Dube'];
const SITES = [
  { label: 'upper notch root', kind: 'notch_root', onFreeEdge: true },
  { label: 'lower notch root', kind: 'notch_root', onFreeEdge: true },
  { label: 'sawn edge', kind: 'machined_edge', onFreeEdge: true },
  { label: 'centre', kind: 'interior', onFreeEdge: false },
] as const;
// After a stored spell of inspections, a tested model goes through the remaining stages.
const TEST_STAGES = [
  { stage: 'before_load', afterH: 1010 },
  { stage: 'under_load', afterH: 1010.5 },
  { stage: 'after_unload', afterH: 1011 },
  { stage: 'before_anneal', afterH: 1012 },
  { stage: 'after_anneal', afterH: 1100 },
] as const;

/** mulberry32: a small repeatable generator, so two runs build the same lab. */
function random(start: number): () => number {
  let a = start >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

export const batchCode = (i: number) => `BX-${String(i + 1).padStart(2, '0')}`;

/** The batch whose residuals sit well above the others, as a real bad lot would. */
export const BAD_BATCH = 6;

export function planModels(plan: HistoryPlan): { models: BenchModel[]; sites: BenchSite[] } {
  const next = random(plan.randomStart);
  const models: BenchModel[] = [];
  const total = plan.batches * plan.modelsPerBatch;
  for (let b = 0; b < plan.batches; b++) {
    for (let j = 0; j < plan.modelsPerBatch; j++) {
      const n = b * plan.modelsPerBatch + j;
      models.push({
        id: randomUUID(),
        code: `${batchCode(b)}-M${String(j + 1).padStart(4, '0')}`,
        batchIndex: b,
        geometryKind: GEOMETRIES[Math.floor(next() * GEOMETRIES.length)]!,
        thicknessMm: next() < 0.5 ? 6 : 10,
        machiningMethod: METHODS[Math.floor(next() * METHODS.length)]!,
        // Batches are machined one after another over two years, models of a batch in order.
        machinedMs: START_MS + (n / total) * SPAN_H * HOUR_MS,
        stillStored: j % 10 === 9,
      });
    }
  }
  const sites = models.flatMap((model) => SITES.map((s) => ({ id: randomUUID(), model, ...s })));
  return { models, sites };
}

/** The readings of one site, in time order; levels and √t growth are invented. */
export function siteReadings(site: BenchSite, plan: HistoryPlan, next: () => number): BenchReading[] {
  const { model } = site;
  const level = model.batchIndex === BAD_BATCH ? 0.24 : 0.05 + 0.01 * (model.batchIndex % 6);
  const siteLevel = site.kind === 'interior' ? 0.3 * level : level;
  const noise = () => (next() - 0.5) * 0.04;
  const order = (v: number) => Math.round(Math.max(0, v) * 10_000) / 10_000;
  const inspections = model.stillStored ? plan.readingsPerSite : plan.readingsPerSite - TEST_STAGES.length;
  const out: BenchReading[] = [];
  const operator = () => OPERATORS[Math.floor(next() * OPERATORS.length)]!;
  for (let k = 0; k < inspections; k++) {
    const hours = 1000 * ((k + 1) / inspections) ** 2;
    const growth = site.kind === 'machined_edge' ? 0.012 * Math.sqrt(hours) : 0;
    out.push({ site, stage: 'inspection', loadN: null, observedMs: model.machinedMs + hours * HOUR_MS, operator: operator(), fringeOrder: order(siteLevel + growth + noise()) });
  }
  if (model.stillStored) return out;
  const byStage: Record<string, number> = { before_load: siteLevel, under_load: siteLevel + 2.5, after_unload: siteLevel + 0.03, before_anneal: siteLevel + 0.03, after_anneal: 0.2 * siteLevel };
  for (const { stage, afterH } of TEST_STAGES) {
    out.push({ site, stage, loadN: stage === 'under_load' ? 800 : null, observedMs: model.machinedMs + afterH * HOUR_MS, operator: operator(), fringeOrder: order(byStage[stage]! + noise()) });
  }
  return out;
}

/** All readings of all sites, in chunks of about chunkRows so callers can stream them. */
export function* readingChunks(sites: readonly BenchSite[], plan: HistoryPlan, chunkRows: number): Generator<BenchReading[]> {
  const next = random(plan.randomStart + 1);
  let chunk: BenchReading[] = [];
  for (const site of sites) {
    chunk.push(...siteReadings(site, plan, next));
    if (chunk.length >= chunkRows) {
      yield chunk;
      chunk = [];
    }
  }
  if (chunk.length > 0) yield chunk;
}
