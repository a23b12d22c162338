import { describe, expect, it } from 'vitest';
import { inLab } from '../support/inLab.ts';

const tardy = (beta: number, lowerOrder = 0) => ({ method: 'tardy', lowerOrder, analyzerRotationDeg: beta, movedFringe: 'lower' });

describe('residual analysis of a model', () => {
  it('analyses the stages of each site with the batch calibration and the limits in force', () =>
    inLab(async ({ admin, technician, make }) => {
      const batch = await make.batch();
      const model = await make.model({ batchId: batch.id, thicknessMm: 6, thicknessUncertaintyMm: 0.02, project: 'fatigue series' });
      const site = await make.site({ modelId: model.id, label: 'upper notch root' });
      // Disk calibration: fσ = 8P/(πDN) = 8·1200/(π·50·5.5) = 11.112 N/mm [C: disk centre, REFERENCES]
      const calibration = await technician.post(`/v1/batches/${batch.id}/calibrations`, {
        specimen: 'disk', loadN: { value: 1200, uncertainty: 6 }, diameterMm: { value: 50, uncertainty: 0.02 }, fringeOrder: { value: 5.5, uncertainty: 0.02 },
        wavelengthNm: 577, observedAt: '2026-11-18T10:00:00Z', operator: 'M. Lindqvist',
      });
      expect(calibration.status).toBe(201);
      expect(calibration.body.fringeValueNPerMm).toBeCloseTo(11.112, 3);

      await make.reading(site.id, { stage: 'before_load', observedAt: '2026-11-20T10:00:00Z', reading: tardy(18) });
      await make.reading(site.id, { stage: 'under_load', loadN: 600, observedAt: '2026-11-20T11:00:00Z', reading: { method: 'whole_order', wholeOrder: 5 } });
      await make.reading(site.id, { stage: 'after_unload', observedAt: '2026-11-20T12:00:00Z', reading: tardy(27) });
      const limits = await admin.post('/v1/acceptance-criteria', { project: 'fatigue series', maxResidualFringeOrder: 0.2 });
      expect(limits.status).toBe(201);

      const reply = await admin.get(`/v1/models/${model.id}/residual-analysis`);
      expect(reply.status).toBe(200);
      const { body } = reply;
      expect(body.fringeValue).toMatchObject({ source: 'batch_calibration', calibrationCount: 1 });
      expect(body.limits).toMatchObject({ source: 'project', criteria: { maxResidualFringeOrder: 0.2 } });
      const [analysed] = body.sites;
      // N_fab = 18/180 = 0.10, N_post = 27/180 = 0.15 (Tardy); N_set = 0.05; share = 0.05/(0.10 + 0.05) = 1/3 [C]
      expect(analysed.analysis.permanentSet.order.value).toBeCloseTo(0.05, 10);
      expect(analysed.analysis.permanentSetShare.share.value).toBeCloseTo(1 / 3, 10);
      expect(analysed.analysis.loadCorrected.order.value).toBeCloseTo(4.9, 10);
      // the model now carries N_post: σ = 0.15·11.112/6 = 0.2778 MPa
      expect(analysed.current.stress.stressMPa.value).toBeCloseTo((0.15 * calibration.body.fringeValueNPerMm) / 6, 10);
      expect(analysed.decision).toBe('conforming');
      expect(body.decision).toBe('conforming');
    }));

  it('says needs annealing when a site is clearly beyond the limit, and model limits override project ones', () =>
    inLab(async ({ admin, make }) => {
      const model = await make.model({ project: 'p1' });
      const site = await make.site({ modelId: model.id });
      await make.reading(site.id, { reading: tardy(60) });
      await admin.post('/v1/acceptance-criteria', { project: 'p1', maxResidualFringeOrder: 0.5 });
      expect((await admin.get(`/v1/models/${model.id}/residual-analysis`)).body.decision).toBe('conforming');
      await admin.post('/v1/acceptance-criteria', { modelId: model.id, maxResidualFringeOrder: 0.2, reason: 'tighter for this model' });
      const tight = (await admin.get(`/v1/models/${model.id}/residual-analysis`)).body;
      expect(tight.limits.source).toBe('model');
      expect(tight.decision).toBe('needs_annealing');
    }));

  it('uses common-practice limits, flagged, when none are set, and the catalogue fringe value when the batch has no calibration', () =>
    inLab(async ({ viewer, make }) => {
      const model = await make.model();
      const body = (await viewer.get(`/v1/models/${model.id}/residual-analysis`)).body;
      expect(body.limits.source).toBe('common_practice');
      expect(body.limits.flag).toMatch(/common practice/);
      expect(body.fringeValue.source).toBe('catalogue');
      expect(body.decision).toBe('no_readings');
    }));

  it('refuses limits without a scope or a limit, and a calibration whose order is noise', () =>
    inLab(async ({ admin, technician, make }) => {
      expect((await admin.post('/v1/acceptance-criteria', { maxResidualFringeOrder: 0.2 })).status).toBe(422);
      expect((await admin.post('/v1/acceptance-criteria', { project: 'x' })).status).toBe(422);
      const batch = await make.batch();
      const noisy = await technician.post(`/v1/batches/${batch.id}/calibrations`, {
        specimen: 'tension_strip', loadN: { value: 600, uncertainty: 3 }, widthMm: { value: 12, uncertainty: 0.02 }, fringeOrder: { value: 0.01, uncertainty: 0.02 },
        wavelengthNm: 577, observedAt: '2026-11-18T10:00:00Z', operator: 'M. Lindqvist',
      });
      expect(noisy.status).toBe(422);
      expect((await technician.get(`/v1/batches/${batch.id}/calibrations`)).body).toEqual([]);
    }));

  it('hides another lab\'s model', () =>
    inLab(async ({ make, otherLab }) => {
      const model = await make.model();
      const other = await otherLab();
      expect((await other.admin.get(`/v1/models/${model.id}/residual-analysis`)).status).toBe(404);
    }));
});
