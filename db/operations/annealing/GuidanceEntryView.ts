import type { annealingGuidanceEntries } from '../../schema/index.ts';

export type GuidanceEntryRow = typeof annealingGuidanceEntries.$inferSelect;

export interface GuidanceEntryView extends GuidanceEntryRow {
  origin: 'published' | 'lab';
  supersededById: string | null;
}
