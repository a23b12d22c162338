import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { converter, formatHex } from 'culori';
import { colourAtRetardation } from '../../../src/colour/colourAtRetardation.ts';
import type { IlluminantSpec } from '../../../src/colour/Illuminant.ts';

// XYZ(D65) → linear sRGB and the sRGB transfer function [M: IEC 61966-2-1:1999, from memory].
const iecMatrix = [
  [3.2406, -1.5372, -0.4986],
  [-0.9689, 1.8758, 0.0415],
  [0.0557, -0.204, 1.057],
];
const encode = (c: number) => (c <= 0.0031308 ? 12.92 * c : 1.055 * Math.pow(c, 1 / 2.4) - 0.055);
const iecRgb = ({ x, y, z }: { x: number; y: number; z: number }) => iecMatrix.map((row) => encode(row[0]! * x + row[1]! * y + row[2]! * z));
const channels = (hex: string) => [1, 3, 5].map((i) => parseInt(hex.slice(i, i + 2), 16) / 255);
const hueDeg = (lab: { a: number; b: number }) => ((Math.atan2(lab.b, lab.a) * 180) / Math.PI + 360) % 360;
const chroma = (lab: { a: number; b: number }) => Math.hypot(lab.a, lab.b);

describe('colourAtRetardation', () => {
  it('gives the sRGB of culori’s own conversion and of the IEC 61966-2-1 matrix at in-gamut points', () => {
    const toRgb = converter('rgb');
    for (const d of [40, 160, 400, 480, 720, 1040, 1320]) {
      const c = colourAtRetardation(d, 'D65');
      expect(c.inSrgbGamut).toBe(true);
      expect(c.srgbHex).toBe(formatHex(toRgb({ mode: 'xyz65', ...c.xyzD65 })));
      iecRgb(c.xyzD65).forEach((v, i) => expect(Math.abs(v - channels(c.srgbHex)[i]!)).toBeLessThanOrEqual(1.5 / 255));
    }
  });
  it('shows the first-order colours in the published order black → grey → white → yellow → orange → red → purple → blue [M: Dally & Riley table]', () => {
    for (const illuminant of ['D65', 'A'] as const) {
      const at = (d: number) => colourAtRetardation(d, illuminant).lab;
      const [black, grey, white] = [at(0), at(160), at(260)];
      expect(black.l).toBe(0);
      expect(grey.l).toBeGreaterThan(60);
      expect(white.l).toBeGreaterThan(grey.l);
      expect(chroma(grey)).toBeLessThan(20);
      expect(chroma(white)).toBeLessThan(10);
      // CIELAB hue falls steadily from yellow (≈90°) through orange, red and purple to blue (≈280°).
      const hues = [350, 460, 520, 577, 620].map((d) => hueDeg(at(d)));
      const unwrapped = hues.map((h) => (h > 180 ? h - 360 : h));
      expect(unwrapped[0]).toBeGreaterThan(80);
      expect(unwrapped[0]).toBeLessThan(100);
      for (let i = 1; i < unwrapped.length; i += 1) expect(unwrapped[i]).toBeLessThan(unwrapped[i - 1]!);
      expect(hues[4]).toBeGreaterThan(250);
      expect(hues[4]).toBeLessThan(290);
      [350, 460, 520, 577, 620].forEach((d) => expect(chroma(at(d))).toBeGreaterThan(30));
    }
  });
  it('is darkest of the first order near the tint of passage [M: published 577 nm]', () => {
    const l = Array.from({ length: 301 }, (_, i) => colourAtRetardation(400 + i, 'D65').lab.l);
    const darkestNm = 400 + l.indexOf(Math.min(...l));
    expect(darkestNm).toBeGreaterThanOrEqual(545);
    expect(darkestNm).toBeLessThanOrEqual(580);
  });
  it('renders the high-order grey (mean over many orders) neutral when adapted, yellowish for lamp A without adaptation [C]', () => {
    const toLab = converter('lab65');
    const meanLab = (adaptation: 'toLampWhite' | 'none') => {
      const sum = { x: 0, y: 0, z: 0 };
      // ~70 periods of the shortest-wavelength fringe, so the sin² mean is ½ at each λ to ~0.3 %.
      const n = 10_000;
      for (let i = 0; i < n; i += 1) {
        const { x, y, z } = colourAtRetardation(10_000 + 3.7 * i, 'A', { adaptation }).xyzD65;
        sum.x += x / n;
        sum.y += y / n;
        sum.z += z / n;
      }
      return toLab({ mode: 'xyz65', ...sum });
    };
    const adapted = meanLab('toLampWhite');
    const raw = meanLab('none');
    expect(adapted.l).toBeCloseTo(76.07, 0); // L* of Y = 0.5 [C, CIE 1976 L*]
    expect(chroma(adapted)).toBeLessThan(2);
    expect(hueDeg(raw)).toBeGreaterThan(60);
    expect(hueDeg(raw)).toBeLessThan(100);
    expect(chroma(raw)).toBeGreaterThan(20);
  });
  it('keeps the displayed colour in gamut and flags out-of-gamut colours', () => {
    const c = colourAtRetardation(560, 'D65');
    expect(c.inSrgbGamut).toBe(false);
    expect(c.srgbHex).toMatch(/^#[0-9a-f]{6}$/);
  });
  it('is deterministic and finite for δ in 0..3000 nm (property)', () => {
    fc.assert(fc.property(fc.double({ min: 0, max: 3000, noNaN: true }), fc.constantFrom<IlluminantSpec>('D65', 'A'), (d, ill) => {
      const a = colourAtRetardation(d, ill);
      expect(colourAtRetardation(d, ill)).toEqual(a);
      expect(a.srgbHex).toMatch(/^#[0-9a-f]{6}$/);
      for (const v of [a.lab.l, a.lab.a, a.lab.b, a.displayedLab.l, a.xyz.x, a.xyz.y, a.xyz.z]) expect(Number.isFinite(v)).toBe(true);
    }));
  });
});
