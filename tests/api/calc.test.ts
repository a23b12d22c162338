import { describe, expect, it } from 'vitest';
import type { Client, Reply } from '../support/client.ts';
import { inLab } from '../support/inLab.ts';

// Expected numbers are worked by hand beside each check ([C]: derived and checked numerically).
const fieldsOf = (reply: Reply): string[] => reply.body.errors.map((e: { field: string }) => e.field);

async function expectInvalid(client: Client, path: string, body: unknown, field: string): Promise<void> {
  const reply = await client.post(path, body);
  expect(reply.status, JSON.stringify(body)).toBe(422);
  expect(reply.headers.get('content-type')).toContain('application/problem+json');
  expect(reply.body.code).toBe('invalid_input');
  expect(fieldsOf(reply)).toContain(field);
}

describe('POST /v1/calc/fringe-order', () => {
  it('turns a Tardy reading in green mercury light into N = n + β/180 and δ = N·λ', () =>
    inLab(async ({ viewer }) => {
      const reply = await viewer.post('/v1/calc/fringe-order', {
        reading: { method: 'tardy', lowerOrder: 2, analyzerRotationDeg: 63, movedFringe: 'lower' },
        wavelengthNm: 546.1,
      });
      expect(reply.status).toBe(200);
      // [C] N = 2 + 63/180 = 2.35; δ = 2.35 · 546.1 = 1283.335 nm; u(δ) = 546.1 · 0.02 = 10.922 nm
      expect(reply.body.fringeOrder.value).toBeCloseTo(2.35, 12);
      expect(reply.body.fringeOrder.uncertainty).toBeCloseTo(0.02, 12);
      expect(reply.body.retardationNm.value).toBeCloseTo(1283.335, 9);
      expect(reply.body.retardationNm.uncertainty).toBeCloseTo(10.922, 9);
      expect(reply.body).toMatchObject({ wavelengthNm: 546.1, light: 'monochromatic', uncertaintySource: 'method_default' });
      expect(reply.body.formula).toContain('n + β/180');
    }));

  it('reads a compensator in white light at 577 nm, with a given uncertainty kept as given', () =>
    inLab(async ({ viewer }) => {
      const reply = await viewer.post('/v1/calc/fringe-order', { reading: { method: 'compensator', retardationNm: 400 }, wavelengthNm: null });
      expect(reply.status).toBe(200);
      // [C] N = 400/577 = 0.693241; u = (5 nm/√12)/577 = 1.4433757/577 = 0.002501518 (rectangular scale resolution)
      expect(reply.body.fringeOrder.value).toBeCloseTo(0.693241, 6);
      expect(reply.body.fringeOrder.uncertainty).toBeCloseTo(0.002501518, 8);
      expect(reply.body.retardationNm.value).toBe(400);
      expect(reply.body).toMatchObject({ wavelengthNm: 577, light: 'white_light' });
      const given = await viewer.post('/v1/calc/fringe-order', { reading: { method: 'direct', fringeOrder: 0.3 }, wavelengthNm: 589.3, uncertaintyFringes: 0.05 });
      expect(given.body.fringeOrder).toEqual({ value: 0.3, uncertainty: 0.05 });
      expect(given.body.uncertaintySource).toBe('given');
    }));

  it('names the bad field in a 422', () =>
    inLab(async ({ viewer }) => {
      const path = '/v1/calc/fringe-order';
      await expectInvalid(viewer, path, { reading: { method: 'direct', fringeOrder: 0.3 }, wavelengthNm: 900 }, 'json.wavelengthNm');
      await expectInvalid(viewer, path, { reading: { method: 'tardy', lowerOrder: 1, analyzerRotationDeg: 200, movedFringe: 'lower' }, wavelengthNm: 577 }, 'json.reading.analyzerRotationDeg');
      await expectInvalid(viewer, path, { reading: { method: 'direct', fringeOrder: 0.3 }, wavelengthNm: 577, uncertaintyFringes: -0.1 }, 'json.uncertaintyFringes');
    }));
});

describe('POST /v1/calc/edge-stress', () => {
  const base = { fringeOrder: { value: 1.5, uncertainty: 0.02 }, thicknessMm: { value: 5, uncertainty: 0.02 } };

  it('gives σ = N·fσ/t with GUM propagation at a free edge', () =>
    inLab(async ({ viewer }) => {
      const reply = await viewer.post('/v1/calc/edge-stress', { ...base, fringeValueNPerMm: { value: 10, uncertainty: 0.3 } });
      expect(reply.status).toBe(200);
      // [C] σ = 1.5·10/5 = 3.0 MPa; u² = (10/5·0.02)² + (1.5/5·0.3)² + (3/5·0.02)² = 0.0016 + 0.0081 + 0.000144 → u = 0.0992169
      expect(reply.body.stressMPa.value).toBeCloseTo(3.0, 12);
      expect(reply.body.stressMPa.uncertainty).toBeCloseTo(Math.sqrt(0.009844), 10);
      expect(reply.body).toMatchObject({ kind: 'edge_stress', wavelengthNm: null, formula: 'σ = N·fσ/t' });
    }));

  it('converts fσ to the reading wavelength in proportion to λ, and says what it gives away from an edge', () =>
    inLab(async ({ viewer }) => {
      const reply = await viewer.post('/v1/calc/edge-stress', {
        ...base,
        fringeValueNPerMm: { value: 10, uncertainty: 0.3, quotedAtWavelengthNm: 577 },
        readingWavelengthNm: 546.1,
        onFreeEdge: false,
      });
      expect(reply.status).toBe(200);
      // [C] fσ = 10·546.1/577 = 9.464471, u = 0.3·546.1/577 = 0.283934; σ1 − σ2 = 1.5·9.464471/5 = 2.839341
      //     u² = (9.464471/5·0.02)² + (0.3·0.283934)² + (2.839341/5·0.02)² = 0.00143322 + 0.00725567 + 0.00012899 → 0.0939036
      expect(reply.body.fringeValueNPerMm.value).toBeCloseTo(9.464471, 6);
      expect(reply.body.fringeValueNPerMm.uncertainty).toBeCloseTo(0.283934, 6);
      expect(reply.body.stressMPa.value).toBeCloseTo(2.839341, 6);
      expect(reply.body.stressMPa.uncertainty).toBeCloseTo(0.0939036, 6);
      expect(reply.body).toMatchObject({ kind: 'principal_stress_difference', wavelengthNm: 546.1 });
      expect(reply.body.notes.join(' ')).toContain('dispersion');
    }));

  it('names the bad field in a 422', () =>
    inLab(async ({ viewer }) => {
      const path = '/v1/calc/edge-stress';
      const fv = { value: 10, uncertainty: 0.3 };
      await expectInvalid(viewer, path, { ...base, fringeValueNPerMm: fv, thicknessMm: { value: 0, uncertainty: 0.02 } }, 'json.thicknessMm.value');
      await expectInvalid(viewer, path, { ...base, fringeValueNPerMm: fv, thicknessMm: { value: 400, uncertainty: 0.02 } }, 'json.thicknessMm.value');
      await expectInvalid(viewer, path, { ...base, fringeValueNPerMm: fv, fringeOrder: { value: 1.5, uncertainty: -1 } }, 'json.fringeOrder.uncertainty');
      await expectInvalid(viewer, path, { ...base, fringeValueNPerMm: { ...fv, quotedAtWavelengthNm: 577 } }, 'json.readingWavelengthNm');
    }));
});

describe('POST /v1/calc/stage-analysis', () => {
  const reading = (value: number) => ({ order: { value, uncertainty: 0.02 }, signKnown: true });
  const material = { fringeValueNPerMm: { value: 7, uncertainty: 0.2 }, thicknessMm: { value: 6, uncertainty: 0.05 } };
  const fullCycle = {
    fabrication: reading(0.3),
    underLoad: { ...reading(2.4), loadN: 400 },
    afterUnload: reading(0.45),
    beforeAnneal: reading(0.45),
    afterAnneal: reading(0.08),
    ...material,
  };

  it('gives every stage quantity and judges the after-anneal residual against common practice with a planned test', () =>
    inLab(async ({ viewer }) => {
      const reply = await viewer.post('/v1/calc/stage-analysis', { ...fullCycle, plannedTest: { plannedLoadN: { value: 400 }, netWidthMm: { value: 20 }, kt: { value: 2.1 } } });
      expect(reply.status).toBe(200);
      const { analysis, fitness } = reply.body;
      // [C] load-corrected 2.4 − 0.3 = 2.1; set 0.45 − 0.3 = 0.15; share 0.15/(0.3 + 0.15) = 1/3;
      //     inelastic 0.15/2.1 = 0.0714286; relief (0.45 − 0.08)/0.45 = 0.822222
      expect(analysis.loadCorrected.order.value).toBeCloseTo(2.1, 12);
      expect(analysis.loadCorrected.stress.stressMPa.value).toBeCloseTo(2.45, 12); // [C] 2.1·7/6
      expect(analysis.permanentSet.order.value).toBeCloseTo(0.15, 12);
      expect(analysis.permanentSetShare.share.value).toBeCloseTo(1 / 3, 12);
      expect(analysis.inelasticFractionOfPeak.ratio.value).toBeCloseTo(0.15 / 2.1, 12);
      expect(analysis.annealRelief.ratio.value).toBeCloseTo(0.37 / 0.45, 12);

      expect(fitness.judgedStage).toBe('afterAnneal');
      expect(fitness.rule).toContain('latest reading present');
      expect(fitness.residualStressMPa.value).toBeCloseTo(0.08 * 7 / 6, 12); // [C] 0.0933333 MPa
      // common practice [M]: ≤ 0.2 fringe and ≤ 10 % of the test order, flagged as such
      expect(fitness).toMatchObject({ criteriaSource: 'common_practice_default', criteria: { maxResidualFringeOrder: 0.2, maxResidualFractionOfTestOrder: 0.1 } });
      expect(fitness.criteriaFlag).toContain('common practice');
      // [C] N_test = Kt·P/(w·fσ) = 2.1·400/(20·7) = 6.0, u = 6·0.2/7 = 0.171429
      expect(fitness.testFringeOrderEstimate.testFringeOrder.value).toBeCloseTo(6, 12);
      expect(fitness.testFringeOrderEstimate.testFringeOrder.uncertainty).toBeCloseTo(0.171429, 6);
      // [C] 0.08 + 2·0.02 = 0.12 ≤ 0.2; fraction 0.08/6 = 0.013333, u = √((0.02/6)² + (0.08·0.171429/36)²) = 0.0033550
      const [order, fraction] = fitness.assessment.criteria;
      expect(order.guardBand).toMatchObject({ decision: 'conforming', value: 0.08, expandedUncertainty: 0.04 });
      expect(fraction.judged.value).toBeCloseTo(0.08 / 6, 12);
      expect(fraction.judged.uncertainty).toBeCloseTo(0.003355, 6);
      expect(fitness.assessment.decision).toBe('conforming');
    }));

  it('judges the latest unloaded reading: before anneal when the anneal is not yet read, against given limits', () =>
    inLab(async ({ viewer }) => {
      const { afterAnneal: _notYet, ...beforeAnnealing } = fullCycle;
      const reply = await viewer.post('/v1/calc/stage-analysis', { ...beforeAnnealing, criteria: { maxResidualFringeOrder: 0.1, maxResidualStressMPa: 0.2 } });
      expect(reply.status).toBe(200);
      const { fitness } = reply.body;
      expect(fitness).toMatchObject({ judgedStage: 'beforeAnneal', criteriaSource: 'given' });
      expect(fitness.criteriaFlag).toBeUndefined();
      // [C] 0.45 − 2·0.02 = 0.41 > 0.1 fringe; σ = 0.45·7/6 = 0.525 MPa, well above 0.2 MPa
      expect(fitness.assessment.criteria.map((c: { guardBand: { decision: string } }) => c.guardBand.decision)).toEqual(['not_conforming', 'not_conforming']);
      expect(fitness.assessment.decision).toBe('needs_annealing');
    }));

  it('is undecided inside the guard band, warns when a load came after the judged reading, and judges nothing when all readings were loaded', () =>
    inLab(async ({ viewer }) => {
      const close = await viewer.post('/v1/calc/stage-analysis', { fabrication: reading(0.18), ...material });
      // [C] 0.18 + 0.04 > 0.2 and 0.18 − 0.04 ≤ 0.2: the interval straddles the limit
      expect(close.body.fitness.assessment.decision).toBe('undecided');
      expect(close.body.fitness.notes.join(' ')).toContain('fraction-of-test-order criterion was left out');

      const loaded = await viewer.post('/v1/calc/stage-analysis', { fabrication: reading(0.05), underLoad: { ...reading(2), loadN: 300 }, ...material });
      expect(loaded.body.fitness.judgedStage).toBe('fabrication');
      expect(loaded.body.fitness.notes.join(' ')).toContain('may differ by the permanent set');

      const onlyLoaded = await viewer.post('/v1/calc/stage-analysis', { underLoad: { ...reading(2), loadN: 300 }, ...material });
      expect(onlyLoaded.status).toBe(200);
      expect(onlyLoaded.body.fitness).toMatchObject({ judgedStage: null, assessment: null, residualOrder: null });
    }));

  it('names the bad field in a 422', () =>
    inLab(async ({ viewer }) => {
      const path = '/v1/calc/stage-analysis';
      await expectInvalid(viewer, path, { fabrication: { order: { value: -0.2, uncertainty: 0.02 } }, ...material }, 'json.fabrication.order.value');
      await expectInvalid(viewer, path, { ...fullCycle, criteria: { maxResidualFractionOfTestOrder: 0.05 } }, 'json.plannedTest');
      await expectInvalid(viewer, path, { ...fullCycle, underLoad: reading(2) }, 'json.underLoad.loadN');
      await expectInvalid(viewer, path, { ...material }, 'json.fabrication');
      await expectInvalid(viewer, path, { ...fullCycle, criteria: {} }, 'json.criteria');
    }));
});

describe('POST /v1/calc/fringe-value', () => {
  it('calibrates from one disk in diametral compression, fσ = 8P/(πDN)', () =>
    inLab(async ({ viewer }) => {
      const reply = await viewer.post('/v1/calc/fringe-value', {
        wavelengthNm: 577,
        points: [{ specimen: 'disk', loadN: { value: 1200, uncertainty: 6 }, diameterMm: { value: 50, uncertainty: 0.02 }, fringeOrder: { value: 5.5, uncertainty: 0.02 } }],
      });
      expect(reply.status).toBe(200);
      // Disk centre σ1 − σ2 = 8P/(πDt) [M: Frocht, Photoelasticity; Dally & Riley, disk calibration]
      // [C] fσ = 9600/(π·50·5.5) = 11.11190; u/fσ = √((6/1200)² + (0.02/50)² + (0.02/5.5)²) = 0.00619544 → u = 0.0688433
      expect(reply.body.fringeValueNPerMm.value).toBeCloseTo(9600 / (Math.PI * 275), 10);
      expect(reply.body.fringeValueNPerMm.uncertainty).toBeCloseTo(0.0688433, 6);
      expect(reply.body).toMatchObject({ basis: 'single_specimen', defined: true, wavelengthNm: 577, fit: null });
      expect(reply.body.points[0].stressLikeNPerMm).toBeCloseTo(9600 / (Math.PI * 50), 10); // [C] 8P/(πD) = 61.1155 N/mm
    }));

  it('fits several tension-strip load steps through the origin', () =>
    inLab(async ({ viewer }) => {
      const step = (loadN: number, order: number) => ({ specimen: 'tension_strip', loadN: { value: loadN }, widthMm: { value: 10 }, fringeOrder: { value: order } });
      const reply = await viewer.post('/v1/calc/fringe-value', { wavelengthNm: 577, points: [step(72, 1), step(138, 2), step(213, 3), step(279, 4)] });
      expect(reply.status).toBe(200);
      // [C] q = P/w = 7.2, 13.8, 21.3, 27.9; ΣNq = 210.3, ΣN² = 30 → fσ = 7.01;
      //     residuals 0.19, −0.22, 0.27, −0.14 → SSE 0.177, s = √(0.177/3) = 0.242899, u = s/√30 = 0.0443471
      expect(reply.body.fringeValueNPerMm.value).toBeCloseTo(7.01, 12);
      expect(reply.body.fringeValueNPerMm.uncertainty).toBeCloseTo(0.0443471, 6);
      expect(reply.body.fit).toMatchObject({ degreesOfFreedom: 3, pointCount: 4 });
      expect(reply.body.fit.residualStandardDeviationNPerMm).toBeCloseTo(0.242899, 6);
      expect(reply.body.basis).toBe('fit_through_origin');
      expect(reply.body.notes.join(' ')).toContain('points[0]: no uncertainty given for loadN, widthMm, fringeOrder');
    }));

  it('returns no value, not a division, when the order cannot be told from zero', () =>
    inLab(async ({ viewer }) => {
      const reply = await viewer.post('/v1/calc/fringe-value', {
        wavelengthNm: 577,
        points: [{ specimen: 'beam', bendingMomentNmm: { value: 50 }, depthMm: { value: 12 }, fringeOrder: { value: 0.02, uncertainty: 0.02 } }],
      });
      expect(reply.status).toBe(200);
      expect(reply.body.defined).toBe(false);
      expect(reply.body.fringeValueNPerMm).toBeUndefined();
      expect(reply.body.reason).toContain('cannot be told from zero');
    }));

  it('names the bad field in a 422', () =>
    inLab(async ({ viewer }) => {
      const path = '/v1/calc/fringe-value';
      const disk = { specimen: 'disk', loadN: { value: 1200 }, diameterMm: { value: 50 }, fringeOrder: { value: 5.5 } };
      await expectInvalid(viewer, path, { wavelengthNm: 300, points: [disk] }, 'json.wavelengthNm');
      await expectInvalid(viewer, path, { wavelengthNm: 577, points: [disk, disk] }, 'json.points');
      await expectInvalid(viewer, path, { wavelengthNm: 577, points: [{ ...disk, diameterMm: { value: -50 } }] }, 'json.points.0.diameterMm.value');
      await expectInvalid(viewer, path, { wavelengthNm: 577, points: [{ ...disk, loadN: { value: 1200, uncertainty: -6 } }] }, 'json.points.0.loadN.uncertainty');
      // passes the schema but not the domain core: a DomainError, mapped to 422 by app.onError
      await expectInvalid(viewer, path, { wavelengthNm: 577, points: [disk, disk, disk] }, 'points');
    }));
});

describe('calculators: access and documentation', () => {
  const paths = ['/v1/calc/fringe-order', '/v1/calc/edge-stress', '/v1/calc/stage-analysis', '/v1/calc/fringe-value'];

  it('refuses a request without a key with 401 problem+json', () =>
    inLab(async ({ anonymous }) => {
      for (const path of paths) {
        const reply = await anonymous.post(path, { wavelengthNm: 577 });
        expect(reply.status, path).toBe(401);
        expect(reply.headers.get('content-type')).toContain('application/problem+json');
      }
    }));

  it('documents each calculator for viewers, with request and response examples', () =>
    inLab(async ({ anonymous }) => {
      const doc = (await anonymous.get('/openapi.json')).body;
      for (const path of paths) expect(doc.paths[path].post['x-min-role'], path).toBe('viewer');
      for (const name of ['FringeOrderCalcInput', 'EdgeStressCalcInput', 'StageAnalysisCalcInput', 'FringeValueCalcInput', 'FringeOrderCalcResult', 'EdgeStressCalcResult', 'StageAnalysisCalcResult', 'FringeValueCalcResult']) {
        expect(doc.components.schemas[name]?.example, name).toBeDefined();
      }
    }));
});
