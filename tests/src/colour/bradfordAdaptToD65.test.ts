import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { converter } from 'culori';
import { bradfordAdaptToD65 } from '../../../src/colour/bradfordAdaptToD65.ts';

const d50White = { x: 0.3457 / 0.3585, y: 1, z: (1 - 0.3457 - 0.3585) / 0.3585 };
const d65White = { x: 0.3127 / 0.329, y: 1, z: (1 - 0.3127 - 0.329) / 0.329 };
const toXyz65 = converter('xyz65');

describe('bradfordAdaptToD65', () => {
  it('agrees with culori’s own Bradford D50 → D65 conversion [reference library: culori 4.0.2]', () => {
    fc.assert(fc.property(fc.double({ min: 0, max: 1, noNaN: true }), fc.double({ min: 0, max: 1, noNaN: true }), fc.double({ min: 0, max: 1, noNaN: true }), (x, y, z) => {
      const ours = bradfordAdaptToD65({ x, y, z }, d50White);
      const theirs = toXyz65({ mode: 'xyz50', x, y, z });
      expect(ours.x).toBeCloseTo(theirs.x, 4);
      expect(ours.y).toBeCloseTo(theirs.y, 4);
      expect(ours.z).toBeCloseTo(theirs.z, 4);
    }));
  });
  it('maps the source white onto D65 white exactly', () => {
    const a = { x: 1.0985, y: 1, z: 0.3558 };
    const w = bradfordAdaptToD65(a, a);
    expect(w.x).toBeCloseTo(d65White.x, 12);
    expect(w.y).toBeCloseTo(1, 12);
    expect(w.z).toBeCloseTo(d65White.z, 12);
  });
  it('changes nothing when the source white already is D65', () => {
    const c = { x: 0.2, y: 0.3, z: 0.4 };
    const out = bradfordAdaptToD65(c, d65White);
    expect(out.x).toBeCloseTo(0.2, 12);
    expect(out.y).toBeCloseTo(0.3, 12);
    expect(out.z).toBeCloseTo(0.4, 12);
  });
});
