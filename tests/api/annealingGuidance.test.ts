import { eq } from 'drizzle-orm';
import { describe, expect, it } from 'vitest';
import { ANNEALING_GUIDANCE_CATALOGUE } from '../../src/annealing/guidanceCatalogue.ts';
import { annealingGuidanceEntries } from '../../db/schema/index.ts';
import { annealingModel } from '../support/annealingHelpers.ts';
import { inLab } from '../support/inLab.ts';

// An invented lab practice for the tests; the flag says it is the lab's own working value.
const house = { document: 'Test lab annealing notebook', locator: 'sheet 1', flag: 'common_practice' };
const HOUSE_ENTRY = {
  key: 'polycarbonate-sheet.test-lab-135',
  title: 'Polycarbonate sheet: test lab cycle at 135 °C',
  materialFamily: 'polycarbonate',
  heating: [],
  heatingRateToSoak: { kind: 'fixed', rateCPerH: { value: 20, source: house } },
  soak: { temperature: { kind: 'absolute', temperatureC: { value: 135, source: house } }, time: { minimumH: { value: 3, source: house } } },
  cooling: [{ rate: { kind: 'fixed', rateCPerH: { value: 4, source: house } }, to: { kind: 'absolute', temperatureC: { value: 40, source: house } } }],
  thermalDiffusivityMm2PerS: { value: 0.144, source: house },
  allowedGradientC: { value: 2, source: house },
};

describe('annealing guidance', () => {
  it('publishes the repository catalogue with its version, one entry per catalogue entry', () =>
    inLab(async ({ viewer }) => {
      const list = await viewer.get('/v1/annealing/guidance');
      expect(list.status).toBe(200);
      const published = list.body.filter((e: { origin: string }) => e.origin === 'published');
      expect(published.map((e: { key: string }) => e.key)).toEqual(ANNEALING_GUIDANCE_CATALOGUE.entries.map((e) => e.key));
      expect(new Set(published.map((e: { catalogueVersion: string }) => e.catalogueVersion))).toEqual(new Set([ANNEALING_GUIDANCE_CATALOGUE.version]));
      expect(published.find((e: { key: string }) => e.key === 'epoxy-anhydride-cast.handbook-practice').materialFamily).toBe('anhydride_cured_epoxy');
      const pc = await viewer.get('/v1/annealing/guidance?materialFamily=polycarbonate');
      expect(pc.body.map((e: { key: string }) => e.key)).toEqual(['polycarbonate-sheet.zakeri-2013', 'polycarbonate-sheet.common-practice']);
    }));

  it('keeps published entries read-only: no amendment (403), no lab entry under their key (409), no UPDATE in the database', () =>
    inLab(async ({ admin, db }) => {
      const [acrylic] = (await admin.get('/v1/annealing/guidance?materialFamily=cast_acrylic')).body;
      const amend = await admin.post(`/v1/annealing/guidance/${acrylic.id}/amendments`, { entry: { ...acrylic.entry, title: 'changed' }, reason: 'try' });
      expect(amend.status).toBe(403);
      const shadow = await admin.post('/v1/annealing/guidance', { entry: { ...acrylic.entry } });
      expect(shadow.status).toBe(409);
      expect(shadow.body.errors).toEqual([{ field: 'entry.key', message: 'already used by a published entry' }]);
      await expect(db.transaction((tx) => tx.update(annealingGuidanceEntries).set({ title: 'changed' }).where(eq(annealingGuidanceEntries.id, acrylic.id)))).rejects.toMatchObject({ cause: { code: 'FL001' } });
      expect((await admin.get(`/v1/annealing/guidance/${acrylic.id}`)).body.entry).toEqual(acrylic.entry);
    }));

  it('checks a lab entry field by field and refuses it from a technician', () =>
    inLab(async ({ admin, technician }) => {
      expect((await technician.post('/v1/annealing/guidance', { entry: HOUSE_ENTRY })).status).toBe(403);
      const bad = await admin.post('/v1/annealing/guidance', { entry: { ...HOUSE_ENTRY, heatingRateToSoak: { kind: 'fixed', rateCPerH: { value: -5, source: house } } } });
      expect(bad.status).toBe(422);
      expect(bad.body.errors).toContainEqual({ field: 'entry.heatingRateToSoak.rateCPerH.value', message: 'must be greater than 0' });
    }));

  it('a lab entry marked as house cycle changes the recommendation; the newest mark wins and history is kept', () =>
    inLab(async ({ admin, viewer, make }) => {
      const { model } = await annealingModel(make, 'polycarbonate', 6);
      const before = await viewer.get(`/v1/models/${model.id}/annealing-recommendation`);
      expect(before.status).toBe(200);
      expect(before.body.cycle).toMatchObject({ key: 'polycarbonate-sheet.zakeri-2013', chosenBy: 'published_default', origin: 'published' });
      expect(before.body.plan.maxTemperatureC).toBe(156);

      const entry = await admin.post('/v1/annealing/guidance', { entry: HOUSE_ENTRY });
      expect(entry.status).toBe(201);
      expect(entry.body).toMatchObject({ origin: 'lab', materialFamily: 'polycarbonate', catalogueVersion: null });
      const mark = await admin.post('/v1/annealing/house-cycles', { materialFamily: 'polycarbonate', guidanceEntryId: entry.body.id, reason: 'shorter cycle' });
      expect(mark.status).toBe(201);
      const withHouse = await viewer.get(`/v1/models/${model.id}/annealing-recommendation`);
      expect(withHouse.body.cycle).toMatchObject({ key: HOUSE_ENTRY.key, chosenBy: 'house_cycle', origin: 'lab' });
      expect(withHouse.body.plan.maxTemperatureC).toBe(135);

      const slower = { ...HOUSE_ENTRY, cooling: [{ ...HOUSE_ENTRY.cooling[0], rate: { kind: 'fixed', rateCPerH: { value: 3, source: house } } }] };
      const amended = await admin.post(`/v1/annealing/guidance/${entry.body.id}/amendments`, { entry: slower, reason: 'edge fringes on thick models' });
      expect(amended.status).toBe(201);
      const afterAmendment = await viewer.get(`/v1/models/${model.id}/annealing-recommendation`);
      expect(afterAmendment.body.cycle.guidanceEntryId).toBe(amended.body.id);
      expect(afterAmendment.body.plan.segments.at(-1).rateCPerH).toBe(3);

      const [published] = (await viewer.get('/v1/annealing/guidance?materialFamily=polycarbonate')).body;
      expect((await admin.post('/v1/annealing/house-cycles', { materialFamily: 'cast_acrylic', guidanceEntryId: published.id })).status).toBe(422);
      await admin.post('/v1/annealing/house-cycles', { materialFamily: 'polycarbonate', guidanceEntryId: published.id, reason: 'back to the published cycle' });
      expect((await viewer.get(`/v1/models/${model.id}/annealing-recommendation`)).body.cycle).toMatchObject({ key: 'polycarbonate-sheet.zakeri-2013', chosenBy: 'house_cycle' });
      const marks = await viewer.get('/v1/annealing/house-cycles?materialFamily=polycarbonate');
      expect(marks.body.map((m: { guidanceKey: string; inForce: boolean }) => [m.guidanceKey, m.inForce])).toEqual([['polycarbonate-sheet.zakeri-2013', true], [HOUSE_ENTRY.key, false]]);
    }));

  it('hides one lab\'s entries from another lab', () =>
    inLab(async ({ admin, otherLab }) => {
      const entry = await admin.post('/v1/annealing/guidance', { entry: HOUSE_ENTRY });
      const other = await otherLab();
      expect((await other.admin.get(`/v1/annealing/guidance/${entry.body.id}`)).status).toBe(404);
      expect((await other.admin.post('/v1/annealing/house-cycles', { materialFamily: 'polycarbonate', guidanceEntryId: entry.body.id })).status).toBe(404);
    }));
});
