import { requireNumber } from '../guards/requireNumber.ts';
import { requireMeasured } from '../uncertainty/requireMeasured.ts';
import type { Measured } from '../uncertainty/Measured.ts';

/** A bare number is taken as exact (u = 0). */
export type MaybeMeasured = number | Measured;

export interface TestFringeOrderInput {
  plannedLoadN: MaybeMeasured;
  netWidthMm: MaybeMeasured;
  thicknessMm: MaybeMeasured;
  /** Stress concentration factor on the net section, σ_root / σ_nom. */
  kt: MaybeMeasured;
  fringeValueNPerMm: MaybeMeasured;
}

export interface TestFringeOrderEstimate {
  nominalStressMPa: Measured;
  rootStressMPa: Measured;
  testFringeOrder: Measured;
}

const asMeasured = (field: string, x: MaybeMeasured): Measured =>
  requireMeasured(field, typeof x === 'number' ? { value: x, uncertainty: 0 } : x, { above: 0 });

// Every factor enters with exponent ±1, so the first-order relative uncertainty is the
// root-sum-square of the factors' relative uncertainties.
const relativeUncertainty = (...factors: Measured[]): number => Math.hypot(...factors.map((m) => m.uncertainty / m.value));

/**
 * Largest fringe order a planned test should produce at the notch root:
 * σ_nom = P/(w_net·t), σ_root = Kt·σ_nom, N_test = σ_root·t/fσ = Kt·P/(w_net·fσ).
 * The thickness cancels in N_test, so u(t) enters σ_nom and σ_root but not N_test.
 *
 * @example
 * estimateTestFringeOrder({ plannedLoadN: 400, netWidthMm: 20, thicknessMm: 6, kt: 2.1,
 *   fringeValueNPerMm: { value: 7.0, uncertainty: 0.2 } });
 * // { nominalStressMPa: { value: 3.3333, uncertainty: 0 },
 * //   rootStressMPa: { value: 7.0, uncertainty: 0 },
 * //   testFringeOrder: { value: 6.0, uncertainty: 0.1714 } }
 */
export function estimateTestFringeOrder(input: TestFringeOrderInput): TestFringeOrderEstimate {
  const p = asMeasured('plannedLoadN', input.plannedLoadN);
  const w = asMeasured('netWidthMm', input.netWidthMm);
  const t = asMeasured('thicknessMm', input.thicknessMm);
  const kt = asMeasured('kt', input.kt);
  const f = asMeasured('fringeValueNPerMm', input.fringeValueNPerMm);
  const nominal = p.value / (w.value * t.value);
  const root = kt.value * nominal;
  const order = (kt.value * p.value) / (w.value * f.value);
  requireNumber('testFringeOrder', order);
  return {
    nominalStressMPa: { value: nominal, uncertainty: nominal * relativeUncertainty(p, w, t) },
    rootStressMPa: { value: root, uncertainty: root * relativeUncertainty(kt, p, w, t) },
    testFringeOrder: { value: order, uncertainty: order * relativeUncertainty(kt, p, w, f) },
  };
}
