import type { SiteReference } from './ParsedImport.ts';

/** The lookup key of a site reference, the same for a row and for a resolved site. */
export function siteKeyOf(ref: SiteReference): string {
  return 'siteId' in ref ? `id:${ref.siteId}` : `code:${JSON.stringify([ref.modelCode, ref.siteLabel])}`;
}
