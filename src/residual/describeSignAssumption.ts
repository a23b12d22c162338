import type { StageName } from './SiteStagesTypes.ts';

/**
 * The note a result carries when some of the readings it uses had no measured sign, or
 * undefined when every sign was measured.
 *
 * @example
 * describeSignAssumption(['fabrication', 'afterUnload']);
 * // 'sign not measured for fabrication, afterUnload: taken as positive (tension), the same
 * //  sign for every unsigned reading'
 * describeSignAssumption([]); // undefined
 */
export function describeSignAssumption(stagesWithAssumedSign: readonly StageName[]): string | undefined {
  if (stagesWithAssumedSign.length === 0) return undefined;
  return `sign not measured for ${stagesWithAssumedSign.join(', ')}: taken as positive (tension), the same sign for every unsigned reading`;
}
