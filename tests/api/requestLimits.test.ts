import { describe, expect, it } from 'vitest';
import { inLab } from '../support/inLab.ts';

describe('request limits and shapes', () => {
  it('refuses a body over the size limit with 413 problem+json and writes nothing', () =>
    inLab(async ({ admin }) => {
      const before = (await admin.get('/v1/materials?limit=200')).body.items.length;
      const huge = JSON.stringify({ name: 'x'.repeat(1_100_000), family: 'other', fringeValueNPerMm: 7, fringeValueUncertaintyNPerMm: 0.1, fringeValueWavelengthNm: 577 });
      const reply = await admin.send('POST', '/v1/materials', { body: huge, headers: { 'content-type': 'application/json' } });
      expect(reply.status).toBe(413);
      expect(reply.headers.get('content-type')).toContain('application/problem+json');
      expect((await admin.get('/v1/materials?limit=200')).body.items.length).toBe(before);
    }));

  it('answers a body without a JSON content type as a client error, never a 500', () =>
    inLab(async ({ admin }) => {
      const reply = await admin.send('POST', '/v1/materials', { body: '{"name":"x"}', headers: { 'content-type': 'text/plain' } });
      expect(reply.status).toBeGreaterThanOrEqual(400);
      expect(reply.status).toBeLessThan(500);
      expect(reply.headers.get('content-type')).toContain('application/problem+json');
    }));

  it('refuses unknown fields rather than dropping them silently', () =>
    inLab(async ({ technician, make }) => {
      const model = await make.model();
      const reply = await technician.post(`/v1/models/${model.id}/sites`, { label: 'a', kind: 'notch_root', onFreeEdge: true, thicknessInches: 0.25 });
      expect(reply.status).toBe(422);
    }));

  it('answers an unknown route and a malformed id with problem+json', () =>
    inLab(async ({ viewer }) => {
      const missing = await viewer.get('/v1/nothing-here');
      expect(missing.status).toBe(404);
      expect(missing.headers.get('content-type')).toContain('application/problem+json');
      const badId = await viewer.get('/v1/models/not-a-uuid');
      expect(badId.status).toBe(422);
      expect(badId.body.errors[0].field).toBe('param.id');
    }));
});
