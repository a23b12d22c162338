import { maximumPlausibleFringeOrder } from '../../../src/optics/maximumPlausibleFringeOrder.ts';
import { resolveWavelengthNm } from '../../../src/optics/resolveWavelengthNm.ts';
import type { PlausibilityContext } from './readPlausibilityContexts.ts';

/** Why a reading's fringe order cannot be right at its site, or undefined when it can be. */
export function implausibleOrderMessage(context: PlausibilityContext, reading: { fringeOrder: number; wavelengthNm: number | null }): string | undefined {
  const limit = maximumPlausibleFringeOrder({ ...context, readingWavelengthNm: resolveWavelengthNm({ wavelengthNm: reading.wavelengthNm }) });
  if (!limit.defined || reading.fringeOrder <= limit.maxFringeOrder) return undefined;
  return `fringe order ${reading.fringeOrder} is implausible for model ${context.modelCode}: ${limit.reason}; check for a misplaced decimal or a wrong column`;
}
