import type { OvenLogComparison } from '../../../src/annealing/OvenLogComparison.ts';
import type { ovenLogs } from '../../schema/index.ts';

export type OvenLogRow = typeof ovenLogs.$inferSelect;

/** The comparison as stored: everything but the per-sample arrays, which the samples table holds. */
export type StoredComparison = Omit<OvenLogComparison, 'elapsedH' | 'expectedC'>;

export interface OvenLogView extends Omit<OvenLogRow, 'comparison'> {
  comparison: StoredComparison;
  supersededById: string | null;
}

export function ovenLogViewOf(row: OvenLogRow, supersededById: string | null): OvenLogView {
  return { ...row, comparison: row.comparison as unknown as StoredComparison, supersededById };
}
