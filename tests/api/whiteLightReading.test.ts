import { describe, expect, it } from 'vitest';
import { inLab } from '../support/inLab.ts';

const base = { stage: 'before_load', observedAt: '2026-11-21T14:05:00Z', operator: 'R. Okafor', wavelengthNm: null };

describe('white-light colour readings', () => {
  it('stores the colour as given and derives the order from the isochromatic sequence', () =>
    inLab(async ({ technician, make }) => {
      const site = await make.site();
      const reply = await technician.post(`/v1/sites/${site.id}/readings`, { ...base, reading: { method: 'white_light_colour', namedColour: 'deep blue' } });
      expect(reply.status).toBe(201);
      expect(reply.body.method).toBe('white_light_colour');
      expect(reply.body.rawInputs).toEqual({ method: 'white_light_colour', namedColour: 'deep blue' });
      // deep blue at 620 nm in the named sequence [M: Dally & Riley table]; N = δ/577 [C]
      expect(reply.body.retardationNm).toBe(620);
      expect(reply.body.fringeOrder).toBeCloseTo(620 / 577, 10);
      expect(reply.body.wavelengthNm).toBeNull();
    }));

  it('feeds the residual analysis like any other reading', () =>
    inLab(async ({ technician, viewer, make }) => {
      const model = await make.model();
      const site = await make.site({ modelId: model.id });
      await technician.post(`/v1/sites/${site.id}/readings`, { ...base, reading: { method: 'white_light_colour', retardationNm: 577 } });
      const analysis = (await viewer.get(`/v1/models/${model.id}/residual-analysis`)).body;
      // one full fringe at a notch root is far beyond the common-practice limit
      expect(analysis.sites[0].current.order.value).toBeCloseTo(1, 6);
      expect(analysis.decision).toBe('needs_annealing');
    }));

  it('refuses a colour reading with a wavelength, with no colour, or with two colours', () =>
    inLab(async ({ technician, make }) => {
      const site = await make.site();
      const post = (body: unknown) => technician.post(`/v1/sites/${site.id}/readings`, body);
      const withWavelength = await post({ ...base, wavelengthNm: 546.1, reading: { method: 'white_light_colour', srgbHex: '#2f2ed1' } });
      expect(withWavelength.status).toBe(422);
      expect(withWavelength.text).toContain('wavelengthNm');
      expect((await post({ ...base, reading: { method: 'white_light_colour' } })).status).toBe(422);
      expect((await post({ ...base, reading: { method: 'white_light_colour', srgbHex: '#2f2ed1', namedColour: 'orange' } })).status).toBe(422);
      expect((await post({ ...base, reading: { method: 'white_light_colour', srgbHex: 'blue' } })).status).toBe(422);
      expect((await post({ ...base, reading: { method: 'white_light_colour', namedColour: 'no such colour' } })).status).toBe(422);
    }));
});
