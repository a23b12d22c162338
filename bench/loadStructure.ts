import type { Sql } from 'postgres';
import { batchCode, type BenchModel, type BenchSite, type HistoryPlan } from './labHistory.ts';

const HOUR_MS = 3_600_000;
const CHUNK = 5000;

async function insertJson(sql: Sql, statement: string, rows: object[], labId: string): Promise<void> {
  for (let i = 0; i < rows.length; i += CHUNK) await sql.unsafe(statement, [JSON.stringify(rows.slice(i, i + CHUNK)), labId]);
}

/**
 * Batches, models, sites and fabrication events of the bench lab, written straight to the
 * database: the bench measures reading import and trends, not these few thousand records.
 */
export async function loadStructure(sql: Sql, labId: string, plan: HistoryPlan, models: BenchModel[], sites: BenchSite[]): Promise<void> {
  const materials = await sql<{ id: string }[]>`select id from materials where lab_id = ${labId} and family in ('polycarbonate', 'cast_acrylic', 'anhydride_cured_epoxy') order by name`;
  const batches = Array.from({ length: plan.batches }, (_, i) => ({ code: batchCode(i), material_id: materials[i % materials.length]!.id }));
  const batchIds = await sql.unsafe<{ id: string; code: string }[]>(
    `insert into batches (lab_id, material_id, code, kind)
     select $1::uuid, x.material_id, x.code, 'sheet_lot' from jsonb_to_recordset($2::text::jsonb) as x(material_id uuid, code text) returning id, code`,
    [labId, JSON.stringify(batches)],
  );
  const idOf = new Map(batchIds.map((b) => [b.code, b.id]));
  await insertJson(
    sql,
    `insert into models (id, lab_id, batch_id, code, geometry_kind, thickness_mm, thickness_uncertainty_mm)
     select x.id, $2::uuid, x.batch_id, x.code, x.geometry_kind::geometry_kind, x.thickness_mm, 0.02
     from jsonb_to_recordset($1::text::jsonb) as x(id uuid, batch_id uuid, code text, geometry_kind text, thickness_mm float8)`,
    models.map((m) => ({ id: m.id, batch_id: idOf.get(batchCode(m.batchIndex)), code: m.code, geometry_kind: m.geometryKind, thickness_mm: m.thicknessMm })),
    labId,
  );
  await insertJson(
    sql,
    `insert into sites (id, lab_id, model_id, label, kind, on_free_edge)
     select x.id, $2::uuid, x.model_id, x.label, x.kind::site_kind, x.on_free_edge
     from jsonb_to_recordset($1::text::jsonb) as x(id uuid, model_id uuid, label text, kind text, on_free_edge boolean)`,
    sites.map((s) => ({ id: s.id, model_id: s.model.id, label: s.label, kind: s.kind, on_free_edge: s.onFreeEdge })),
    labId,
  );
  const at = (ms: number) => new Date(ms).toISOString();
  const events = models.flatMap((m) => [
    { model_id: m.id, kind: 'machined', occurred_at: at(m.machinedMs), machining_method: m.machiningMethod },
    { model_id: m.id, kind: 'stored', occurred_at: at(m.machinedMs + 0.5 * HOUR_MS), machining_method: null },
    ...(m.stillStored
      ? []
      : [
          { model_id: m.id, kind: 'loaded', occurred_at: at(m.machinedMs + 1010.25 * HOUR_MS), machining_method: null },
          { model_id: m.id, kind: 'annealed', occurred_at: at(m.machinedMs + 1050 * HOUR_MS), machining_method: null },
        ]),
  ]);
  await insertJson(
    sql,
    `insert into model_events (lab_id, model_id, kind, occurred_at, operator, machining_method)
     select $2::uuid, x.model_id, x.kind::event_kind, x.occurred_at, 'bench', x.machining_method
     from jsonb_to_recordset($1::text::jsonb) as x(model_id uuid, kind text, occurred_at timestamptz, machining_method text)`,
    events,
    labId,
  );
}
