import type { SourceRef } from './AnnealingGuidance.ts';

/**
 * Records sources in a plan's source list once each, keyed by document, locator and flag.
 *
 * @example
 * const seen = new Map();
 * addSources(seen, [{ document: 'D', locator: 'Table 1', flag: 'read' }]);
 * addSources(seen, [{ document: 'D', locator: 'Table 1', flag: 'read' }]);
 * seen.size; // 1
 */
export function addSources(seen: Map<string, SourceRef>, sources: readonly SourceRef[]): void {
  for (const s of sources) seen.set(`${s.document}\u0000${s.locator}\u0000${s.flag}`, s);
}
