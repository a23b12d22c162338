import { describe, expect, it } from 'vitest';
import { describeSignAssumption } from '../../../src/residual/describeSignAssumption.ts';

describe('describeSignAssumption', () => {
  it('names the stages and the assumed sign', () => {
    const note = describeSignAssumption(['fabrication', 'afterUnload']);
    expect(note).toContain('fabrication, afterUnload');
    expect(note).toContain('positive (tension)');
    expect(note).toContain('same sign');
  });
  it('says nothing when every sign was measured', () => {
    expect(describeSignAssumption([])).toBeUndefined();
  });
});
