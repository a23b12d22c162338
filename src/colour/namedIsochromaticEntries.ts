import { DomainError } from '../errors/DomainError.ts';
import { isochromaticNamedSequence } from './isochromaticNamedSequence.ts';
import type { NamedIsochromatic } from './isochromaticNamedSequence.ts';

// Spellings a technician may type for the same table name.
const aliases: Record<string, string> = {
  gray: 'grey',
  purple: 'purple, tint of passage',
  'tint of passage': 'purple, tint of passage',
  'purple tint of passage': 'purple, tint of passage',
  'red-green transition': 'red/green transition',
  'red green transition': 'red/green transition',
  'blue green': 'blue-green',
  'green yellow': 'green-yellow',
};

const normalise = (name: string): string => name.trim().toLowerCase().replace(/\s+/g, ' ');

/**
 * All entries of the named isochromatic sequence carrying this name (case and spacing
 * ignored; 'gray', 'purple', 'tint of passage' accepted). A name that recurs in several orders
 * returns several entries, lowest retardation first. Unknown names are an `invalid_input` error
 * listing the known ones.
 *
 * @example
 * namedIsochromaticEntries('Orange').map((e) => e.retardationNm); // [460, 940]
 * namedIsochromaticEntries('tint of passage').map((e) => e.fringeOrder); // [1, 2]
 */
export function namedIsochromaticEntries(name: string): NamedIsochromatic[] {
  if (typeof name !== 'string') {
    throw new DomainError('invalid_input', 'namedColour must be a string', [{ field: 'namedColour', message: 'must be a string' }]);
  }
  const key = normalise(name);
  const canonical = aliases[key] ?? key;
  const entries = isochromaticNamedSequence.filter((entry) => entry.name === canonical);
  if (entries.length === 0) {
    const known = [...new Set(isochromaticNamedSequence.map((entry) => entry.name))].join('; ');
    throw new DomainError('invalid_input', `unknown isochromatic colour name '${name}'`, [
      { field: 'namedColour', message: `must be one of: ${known}` },
    ]);
  }
  return entries;
}
