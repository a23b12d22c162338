import type { SourceRef, TemperatureTarget } from './AnnealingGuidance.ts';

const REFERENCE_NAMES: Record<string, string> = {
  glass_transition: 'Tg',
  deflection_temperature: 'deflection temperature',
  annealing_point: 'annealing point',
  strain_point: 'strain point',
  softening_point: 'softening point',
};

/**
 * Turns a guidance temperature target into °C, with the sources it rests on and a short
 * description for plan labels.
 *
 * @example
 * resolveTemperatureTarget({ kind: 'relative', reference: 'glass_transition',
 *   referenceTemperatureC: { value: 130, source: S }, offsetC: { value: 10, source: S } }, 23);
 * // { temperatureC: 140, description: 'Tg 130 °C + 10 °C', sources: [S, S] }
 */
export function resolveTemperatureTarget(
  target: TemperatureTarget,
  startTemperatureC: number,
): { temperatureC: number; description: string; sources: SourceRef[] } {
  switch (target.kind) {
    case 'absolute':
      return { temperatureC: target.temperatureC.value, description: `${target.temperatureC.value} °C`, sources: [target.temperatureC.source] };
    case 'relative': {
      const ref = target.referenceTemperatureC.value;
      const offset = target.offsetC.value;
      const sign = offset < 0 ? '−' : '+';
      return {
        temperatureC: ref + offset,
        description: `${REFERENCE_NAMES[target.reference]} ${ref} °C ${sign} ${Math.abs(offset)} °C`,
        sources: [target.referenceTemperatureC.source, target.offsetC.source],
      };
    }
    case 'start_temperature':
      return { temperatureC: startTemperatureC, description: `start temperature ${startTemperatureC} °C`, sources: [target.source] };
  }
}
