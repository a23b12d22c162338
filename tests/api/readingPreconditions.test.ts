import { describe, expect, it } from 'vitest';
import { inLab } from '../support/inLab.ts';

const amendment = (reason: string) => ({ stage: 'before_load', observedAt: '2026-11-21T14:05:00Z', operator: 'B. Berg', wavelengthNm: 577, reading: { method: 'direct', fringeOrder: 0.12 }, reason });

describe('ETag and If-Match on readings', () => {
  it('tags a reading by its state, honours a matching If-Match and refuses a stale one with 412', () =>
    inLab(async ({ make, technician, viewer }) => {
      const site = await make.site();
      const reading = await make.reading(site.id);
      const first = await viewer.get(`/v1/readings/${reading.id}`);
      expect(first.headers.get('etag')).toBe(`"${reading.id}:current"`);
      const etag = first.headers.get('etag')!;
      const won = await technician.post(`/v1/readings/${reading.id}/amendments`, amendment('misread angle'), { 'if-match': etag });
      expect(won.status).toBe(201);
      expect((await viewer.get(`/v1/readings/${reading.id}`)).headers.get('etag')).toBe(`"${reading.id}:${won.body.id}"`);
      const stale = await technician.post(`/v1/readings/${reading.id}/amendments`, amendment('second try'), { 'if-match': etag });
      expect(stale.status).toBe(412);
      expect(stale.body.code).toBe('precondition_failed');
      // Without If-Match the rule of the chain still holds: only the current reading is amended.
      expect((await technician.post(`/v1/readings/${reading.id}/amendments`, amendment('third try'))).status).toBe(409);
      expect((await technician.post(`/v1/readings/${won.body.id}/amendments`, amendment('on the current one'), { 'if-match': '*' })).status).toBe(201);
    }));
});
