import { type SQL, sql } from 'drizzle-orm';
import type { TrendDimension } from '../../inputs/trends.ts';

// Weeks are ISO weeks and months calendar months, both in UTC, so a key never depends on the
// server's time zone. Keys are the lab-unique batch code and material name, readable and stable.
const KEYS: Record<TrendDimension, string> = {
  batch: 'tr.batch_code',
  material: 'tr.material_name',
  geometryKind: 'tr.geometry_kind',
  machiningMethod: 'tr.machining_method',
  operator: 'tr.operator',
  siteKind: 'tr.site_kind',
  week: `to_char(tr.observed_at at time zone 'UTC', 'IYYY-"W"IW')`,
  month: `to_char(tr.observed_at at time zone 'UTC', 'YYYY-MM')`,
};

export const GROUP_KEY_NOTES: Record<TrendDimension, string> = {
  batch: 'Groups are batches, keyed by batch code.',
  material: 'Groups are materials, keyed by material name.',
  geometryKind: 'Groups are geometry kinds.',
  machiningMethod: 'Groups are machining methods of the latest machining event at or before each reading; null collects readings with no machining recorded before them.',
  operator: 'Groups are the operators who took the readings.',
  siteKind: 'Groups are site kinds.',
  week: 'Groups are ISO weeks of the observation time in UTC (e.g. 2026-W47).',
  month: 'Groups are calendar months of the observation time in UTC (e.g. 2026-11).',
};

/** The text key of a reading's group, over the trend source aliased `tr`. */
export function groupKeySql(dimension: TrendDimension): SQL {
  return sql.raw(KEYS[dimension]);
}
