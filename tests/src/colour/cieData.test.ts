import { describe, expect, it } from 'vitest';
import { cie1931StandardObserver5Nm as observer } from '../../../src/colour/data/cie1931StandardObserver5Nm.ts';
import { cieD65RelativePower5Nm as d65 } from '../../../src/colour/data/cieD65RelativePower5Nm.ts';
import { illuminantWhiteXyz } from '../../../src/colour/illuminantWhiteXyz.ts';

const chromaticity = (w: { x: number; y: number; z: number }) => ({ x: w.x / (w.x + w.y + w.z), y: w.y / (w.x + w.y + w.z) });

describe('CIE tables', () => {
  it('cover 380–780 nm in 5 nm steps', () => {
    for (const column of [observer.xBar, observer.yBar, observer.zBar, d65.relativePower]) expect(column).toHaveLength(81);
  });
  it('ȳ peaks at 555 nm with value 1 [R: CIE data set 10.25039/CIE.DS.xvudnb9b, the photopic V(λ) maximum]', () => {
    const peak = Math.max(...observer.yBar);
    expect(peak).toBe(1);
    expect(observer.startNm + observer.yBar.indexOf(peak) * observer.stepNm).toBe(555);
  });
  it('x̄ peaks at 600 nm (1.0622) and z̄ at 445 nm (1.7826) [R: CIE data set, rows read in the CIE file]', () => {
    expect(observer.startNm + observer.xBar.indexOf(Math.max(...observer.xBar)) * 5).toBe(600);
    expect(observer.startNm + observer.zBar.indexOf(Math.max(...observer.zBar)) * 5).toBe(445);
  });
  it('D65 is normalised to 100 at 560 nm [R: CIE data set 10.25039/CIE.DS.hjfjmt59]', () => {
    expect(d65.relativePower[(560 - d65.startNm) / d65.stepNm]).toBe(100);
  });
  it('D65 white point from the 5 nm sums is x 0.31272, y 0.32903 [M: CIE 015, Table T.3, from memory]', () => {
    const c = chromaticity(illuminantWhiteXyz('D65'));
    expect(c.x).toBeCloseTo(0.31272, 4);
    expect(c.y).toBeCloseTo(0.32903, 4);
  });
  it('illuminant A white point is x 0.44757, y 0.40745 [M: CIE 015, Table T.3, from memory]', () => {
    const c = chromaticity(illuminantWhiteXyz('A'));
    expect(c.x).toBeCloseTo(0.44757, 4);
    expect(c.y).toBeCloseTo(0.40745, 4);
  });
  it('the equal-energy illuminant sits at x = y = 1/3 (the CMFs have equal areas) [R: CIE 1931 definition]', () => {
    const c = chromaticity(illuminantWhiteXyz('E'));
    expect(c.x).toBeCloseTo(1 / 3, 4);
    expect(c.y).toBeCloseTo(1 / 3, 4);
  });
});
