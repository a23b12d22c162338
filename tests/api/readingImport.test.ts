import { describe, expect, it } from 'vitest';
import { inLab } from '../support/inLab.ts';
import { csvOf, modelWithSites, postCsv, storedCounts } from './readingTransferFixtures.ts';

const HEADER = 'model_code,site_label,stage,load_n,observed_at,operator,wavelength_nm,method,whole_order,lower_order,analyzer_rotation_deg,moved_fringe,retardation_nm,fringe_order,sign,notes';
const at = (minute: number) => `2026-11-21T14:${String(minute).padStart(2, '0')}:00Z`;

// Expected fringe orders: Tardy N = n + β/180 (moved lower) or n + 1 − β/180 (moved upper) and
// Sénarmont N = n + β/180, from memory [M] (Dally & Riley, Experimental Stress Analysis, ch. on
// compensation); compensator N = δ/λ and δ = N·λ by the definition of retardation (common practice).
const GOOD = csvOf([
  HEADER,
  `UN-07,upper notch root,before_load,,${at(1)},R. Okafor,577,whole_order,3,,,,,,unknown,`,
  `UN-07,upper notch root,under_load,450,${at(2)},R. Okafor,577,tardy,,1,45,lower,,,positive,"first load, 450 N"`,
  `UN-07,lower notch root,after_unload,,${at(3)},R. Okafor,,tardy,,1,54,upper,,,unknown,white light`,
  `UN-07,lower notch root,before_anneal,,${at(4)},R. Okafor,546,senarmont,2,,36,,,,negative,`,
  `UN-07,upper notch root,after_anneal,,${at(5)},R. Okafor,577,compensator,,,,,1154,,unknown,`,
  `UN-07,lower notch root,inspection,,${at(6)},R. Okafor,577,direct,,,,,,0.8,unknown,`,
]);
const EXPECTED_ORDERS = [3, 1.25, 1.7, 2.2, 2, 0.8];

describe('importing readings from a CSV file', () => {
  it('stores every row with the fringe order derived from its raw inputs', () =>
    inLab(async ({ db, labId, technician, viewer, make }) => {
      const { sites } = await modelWithSites(make, 'UN-07', ['upper notch root', 'lower notch root']);
      const reply = await postCsv(technician, GOOD);
      expect(reply.status, reply.text).toBe(201);
      expect(reply.body).toMatchObject({ rowCount: 6, format: 'csv', replayed: false });
      expect(reply.body.readingIds).toHaveLength(6);
      const stored = await Promise.all(reply.body.readingIds.map(async (id: string) => (await viewer.get(`/v1/readings/${id}`)).body));
      stored.forEach((reading, i) => {
        expect(reading.fringeOrder, `row ${i + 2}`).toBeCloseTo(EXPECTED_ORDERS[i]!, 10);
        expect(reading.importId).toBe(reply.body.importId);
      });
      expect(stored[1]).toMatchObject({ siteId: sites['upper notch root']!.id, stage: 'under_load', loadN: 450, sign: 'positive', notes: 'first load, 450 N' });
      // White light: the core refers the order to 577 nm (δ = N·λ = 1.7 × 577 nm).
      expect(stored[2]).toMatchObject({ siteId: sites['lower notch root']!.id, wavelengthNm: null });
      expect(stored[2].retardationNm).toBeCloseTo(1.7 * 577, 6);
      expect(stored[4].retardationNm).toBe(1154);
      expect(await storedCounts(db, labId)).toEqual({ readings: 6, imports: 1 });
    }));

  it('names a site by site_id as well', () =>
    inLab(async ({ technician, make }) => {
      const { sites } = await modelWithSites(make, 'UN-08', ['edge']);
      const csv = csvOf(['site_id,stage,observed_at,operator,wavelength_nm,method,whole_order', `${sites.edge!.id},before_load,${at(1)},R. Okafor,577,whole_order,2`]);
      const reply = await postCsv(technician, csv);
      expect(reply.status, reply.text).toBe(201);
      expect(reply.body.rowCount).toBe(1);
    }));

  const refusals: [string, string, { row: number; field: string }][] = [
    ['text in a numeric cell', `UN-07,upper notch root,before_load,,${at(1)},R. Okafor,577,whole_order,three,,,,,,unknown,`, { row: 3, field: 'whole_order' }],
    ['a comma decimal', `UN-07,upper notch root,under_load,"12,5",${at(1)},R. Okafor,577,whole_order,3,,,,,,unknown,`, { row: 3, field: 'load_n' }],
    ['an unknown site', `UN-07,no such site,before_load,,${at(1)},R. Okafor,577,whole_order,3,,,,,,unknown,`, { row: 3, field: 'site_label' }],
    ['a bad stage', `UN-07,upper notch root,halfway,,${at(1)},R. Okafor,577,whole_order,3,,,,,,unknown,`, { row: 3, field: 'stage' }],
    ['a ragged row', `UN-07,upper notch root,before_load,,${at(1)},R. Okafor,577,whole_order,3`, { row: 3, field: 'file' }],
    ['an input of another method', `UN-07,upper notch root,before_load,,${at(1)},R. Okafor,577,whole_order,3,1,,,,,unknown,`, { row: 3, field: 'lower_order' }],
    ['a load outside under_load', `UN-07,upper notch root,before_load,300,${at(1)},R. Okafor,577,whole_order,3,,,,,,unknown,`, { row: 3, field: 'load_n' }],
    ['a derived value that contradicts the inputs', `UN-07,upper notch root,before_load,,${at(1)},R. Okafor,577,whole_order,3,,,,,3.5,unknown,`, { row: 3, field: 'fringe_order' }],
  ];
  for (const [what, badLine, where] of refusals) {
    it(`refuses the whole file for ${what}, naming row and field, and writes nothing`, () =>
      inLab(async ({ db, labId, technician, make }) => {
        await modelWithSites(make, 'UN-07', ['upper notch root']);
        const before = await storedCounts(db, labId);
        const good = `UN-07,upper notch root,before_load,,${at(0)},R. Okafor,577,whole_order,1,,,,,,unknown,`;
        const reply = await postCsv(technician, csvOf([HEADER, good, badLine, good.replace(at(0), at(9))]));
        expect(reply.status, reply.text).toBe(422);
        expect(reply.headers.get('content-type')).toContain('application/problem+json');
        expect(reply.body.errors).toEqual([expect.objectContaining(where)]);
        expect(await storedCounts(db, labId)).toEqual(before);
      }));
  }

  it('refuses a header with a missing required column or an unknown column (row 1)', () =>
    inLab(async ({ db, labId, technician, make }) => {
      await modelWithSites(make, 'UN-07', ['upper notch root']);
      const missing = await postCsv(technician, csvOf(['model_code,site_label,stage,observed_at,wavelength_nm,method,whole_order', `UN-07,upper notch root,before_load,${at(1)},577,whole_order,1`]));
      expect(missing.status).toBe(422);
      expect(missing.body.errors).toEqual([{ row: 1, field: 'operator', message: 'required column is missing' }]);
      const unknown = await postCsv(technician, csvOf([`${HEADER},colour`, `UN-07,upper notch root,before_load,,${at(1)},R. Okafor,577,whole_order,1,,,,,,unknown,,red`]));
      expect(unknown.status).toBe(422);
      expect(unknown.body.errors).toEqual([expect.objectContaining({ row: 1, field: 'colour' })]);
      expect((await storedCounts(db, labId)).readings).toBe(0);
    }));

  it('lists the problems of every bad row at once, and caps a long list', () =>
    inLab(async ({ technician, make }) => {
      await modelWithSites(make, 'UN-07', ['upper notch root']);
      const line = (i: number, order: string) => `UN-07,upper notch root,before_load,,${at(i % 60)},R. Okafor,577,whole_order,${order},,,,,,unknown,`;
      const some = await postCsv(technician, csvOf([HEADER, line(1, '1'), line(2, 'x'), line(3, '2'), line(4, '-1')]));
      expect(some.body.errors.map((e: { row: number; field: string }) => [e.row, e.field])).toEqual([[3, 'whole_order'], [5, 'whole_order']]);
      const many = await postCsv(technician, csvOf([HEADER, ...Array.from({ length: 250 }, (_, i) => line(i, 'x'))]));
      expect(many.status).toBe(422);
      expect(many.body.errors).toHaveLength(201);
      expect(many.body.errors[200]).toEqual({ field: 'file', message: 'and 50 more problems not listed' });
      expect(many.body.detail).toContain('250 problems in 250 rows');
    }));

  it('refuses invalid UTF-8 with the row it is on', () =>
    inLab(async ({ technician, make }) => {
      await modelWithSites(make, 'UN-07', ['upper notch root']);
      const head = new TextEncoder().encode(csvOf([HEADER, `UN-07,upper notch root,before_load,,${at(1)},R. Okafor,577,whole_order,1,,,,,,unknown,`]));
      const bad = new TextEncoder().encode(`UN-07,upper notch root,before_load,,${at(2)},R. Ok`);
      const tail = new TextEncoder().encode('afor,577,whole_order,1,,,,,,unknown,\n');
      const body = new Uint8Array([...head, ...bad, 0xff, ...tail]);
      const reply = await postCsv(technician, body);
      expect(reply.status).toBe(422);
      expect(reply.body.errors).toEqual([expect.objectContaining({ row: 3, field: 'file' })]);
    }));

  it('inserts a large file in chunks through one jsonb parameter each', () =>
    inLab(async ({ db, labId, technician, make }) => {
      await modelWithSites(make, 'UN-09', ['edge']);
      const lines = Array.from({ length: 4500 }, (_, i) => `UN-09,edge,before_load,,2026-11-21T14:05:${String(i % 60).padStart(2, '0')}.${String(i).padStart(4, '0').slice(0, 3)}Z,R. Okafor,577,whole_order,${i % 7},,,,,,unknown,`);
      const reply = await postCsv(technician, csvOf([HEADER, ...lines]));
      expect(reply.status, reply.text.slice(0, 500)).toBe(201);
      expect(reply.body.rowCount).toBe(4500);
      expect(reply.body.readingIds).toBeUndefined();
      expect((await storedCounts(db, labId)).readings).toBe(4500);
    }));

  it('refuses a large file for a problem in its last chunk and keeps none of the chunks already inserted', () =>
    inLab(async ({ db, labId, technician, make }) => {
      await modelWithSites(make, 'UN-10', ['edge']);
      const before = await storedCounts(db, labId);
      const line = (i: number, order: string) => `UN-10,edge,before_load,,2026-11-21T14:05:${String(i % 60).padStart(2, '0')}Z,R. Okafor,577,whole_order,${order},,,,,,unknown,`;
      const lines = Array.from({ length: 9000 }, (_, i) => line(i, String(i % 7)));
      lines[8800] = line(8800, '"2,5"');
      const reply = await postCsv(technician, csvOf([HEADER, ...lines]));
      expect(reply.status, reply.text.slice(0, 500)).toBe(422);
      // Row numbers count the header as row 1.
      expect(reply.body.errors).toEqual([expect.objectContaining({ row: 8802, field: 'whole_order' })]);
      expect(await storedCounts(db, labId)).toEqual(before);
    }));
});

describe('amendments in an imported file', () => {
  const EXPORT_HEADER = 'id,model_code,site_label,stage,observed_at,operator,wavelength_nm,method,whole_order,supersedes_id,amendment_reason';
  const row = (id: string, label: string, order: number, supersedes = '', reason = '') => `${id},UN-11,${label},before_load,${at(1)},R. Okafor,577,whole_order,${order},${supersedes},${reason}`;

  it('refuses links it cannot rebuild, naming the row, and writes nothing', () =>
    inLab(async ({ db, labId, technician, make }) => {
      await modelWithSites(make, 'UN-11', ['upper', 'lower']);
      const before = await storedCounts(db, labId);
      const cases: [string[], { row: number; field: string; message: RegExp }][] = [
        [[row('a', 'upper', 1, 'b', 'misread'), row('b', 'upper', 2, 'a', 'misread')], { row: 2, field: 'supersedes_id', message: /loop through rows 2, 3/ }],
        [[row('a', 'upper', 1), row('b', 'upper', 2, 'a', 'misread'), row('c', 'upper', 3, 'a', 'again')], { row: 4, field: 'supersedes_id', message: /row 3 already supersedes row 2/ }],
        [[row('a', 'upper', 1), row('b', 'lower', 2, 'a', 'misread')], { row: 3, field: 'supersedes_id', message: /another site/ }],
        [[row('a', 'upper', 1), row('b', 'upper', 2, 'a')], { row: 3, field: 'amendment_reason', message: /needs its reason/ }],
        [[row('a', 'upper', 1), row('a', 'upper', 2)], { row: 3, field: 'id', message: /also the id of row 2/ }],
      ];
      for (const [lines, problem] of cases) {
        const reply = await postCsv(technician, csvOf([EXPORT_HEADER, ...lines]));
        expect(reply.status, reply.text).toBe(422);
        expect(reply.body.errors).toEqual([expect.objectContaining({ ...problem, message: expect.stringMatching(problem.message) })]);
      }
      expect(await storedCounts(db, labId)).toEqual(before);
    }));

  it('links an amendment listed before the reading it supersedes', () =>
    inLab(async ({ technician, viewer, make }) => {
      await modelWithSites(make, 'UN-11', ['upper']);
      const reply = await postCsv(technician, csvOf([EXPORT_HEADER, row('b', 'upper', 2, 'a', 'misread'), row('a', 'upper', 1)]));
      expect(reply.status, reply.text).toBe(201);
      const [amendment, original] = reply.body.readingIds;
      expect((await viewer.get(`/v1/readings/${amendment}`)).body).toMatchObject({ supersedesId: original, amendmentReason: 'misread', fringeOrder: 2 });
      expect((await viewer.get(`/v1/readings/${original}`)).body).toMatchObject({ supersededById: amendment, fringeOrder: 1 });
    }));

  it('drops a supersedes id that names no row of the file, importing the row as an original', () =>
    inLab(async ({ technician, viewer, make }) => {
      await modelWithSites(make, 'UN-11', ['upper']);
      const reply = await postCsv(technician, csvOf([EXPORT_HEADER, row('b', 'upper', 2, '7d0c6f5e-3a3b-4c55-9f0e-2d9a4b8b1c11', 'misread')]));
      expect(reply.status, reply.text).toBe(201);
      expect((await viewer.get(`/v1/readings/${reply.body.readingIds[0]}`)).body).toMatchObject({ supersedesId: null, amendmentReason: null });
    }));
});

describe('importing readings from JSON, idempotency and content types', () => {
  const jsonFile = {
    readings: [
      { modelCode: 'UN-07', siteLabel: 'upper notch root', stage: 'before_load', observedAt: at(1), operator: 'R. Okafor', wavelengthNm: 577, reading: { method: 'tardy', lowerOrder: 0, analyzerRotationDeg: 27, movedFringe: 'lower' } },
      { modelCode: 'UN-07', siteLabel: 'upper notch root', stage: 'under_load', loadN: 450, observedAt: at(2), operator: 'R. Okafor', wavelengthNm: 577, reading: { method: 'whole_order', wholeOrder: 4 }, sign: 'positive' },
    ],
  };

  it('imports { readings: [...] } of ReadingInput plus site names', () =>
    inLab(async ({ technician, viewer, make }) => {
      await modelWithSites(make, 'UN-07', ['upper notch root']);
      const reply = await technician.post('/v1/readings/import', jsonFile);
      expect(reply.status, reply.text).toBe(201);
      expect(reply.body).toMatchObject({ rowCount: 2, format: 'json' });
      // Tardy N = n + β/180 = 0 + 27/180 = 0.15, from memory [M] (Dally & Riley).
      expect((await viewer.get(`/v1/readings/${reply.body.readingIds[0]}`)).body.fringeOrder).toBeCloseTo(0.15, 10);
      expect((await viewer.get(`/v1/readings/${reply.body.readingIds[1]}`)).body.fringeOrder).toBe(4);
    }));

  it('names JSON rows from 1 and fields by their JSON path', () =>
    inLab(async ({ db, labId, technician, make }) => {
      await modelWithSites(make, 'UN-07', ['upper notch root']);
      const bad = structuredClone(jsonFile);
      (bad.readings[1]!.reading as Record<string, unknown>).wholeOrder = 'four';
      const reply = await technician.post('/v1/readings/import', bad);
      expect(reply.status).toBe(422);
      expect(reply.body.errors).toEqual([expect.objectContaining({ row: 2, field: 'reading.wholeOrder' })]);
      expect((await storedCounts(db, labId)).readings).toBe(0);
    }));

  it('replays the same Idempotency-Key and body without writing, and refuses it with another body', () =>
    inLab(async ({ db, labId, technician, make }) => {
      await modelWithSites(make, 'UN-07', ['upper notch root']);
      const key = { 'idempotency-key': 'bench-sheet-2026-11-21' };
      const first = await technician.post('/v1/readings/import', jsonFile, key);
      expect(first.status).toBe(201);
      const again = await technician.post('/v1/readings/import', jsonFile, key);
      expect(again.status).toBe(200);
      expect(again.body).toMatchObject({ importId: first.body.importId, rowCount: 2, format: 'json', replayed: true });
      expect(await storedCounts(db, labId)).toEqual({ readings: 2, imports: 1 });
      const other = await technician.post('/v1/readings/import', { readings: jsonFile.readings.slice(0, 1) }, key);
      expect(other.status).toBe(409);
      expect(await storedCounts(db, labId)).toEqual({ readings: 2, imports: 1 });
      const tooLong = await technician.post('/v1/readings/import', jsonFile, { 'idempotency-key': 'k'.repeat(201) });
      expect(tooLong.status).toBe(422);
    }));

  it('answers 415 to any other content type, and leaves import to technicians', () =>
    inLab(async ({ technician, viewer }) => {
      const plain = await technician.send('POST', '/v1/readings/import', { body: 'a,b\n', headers: { 'content-type': 'text/plain' } });
      expect(plain.status).toBe(415);
      expect(plain.headers.get('content-type')).toContain('application/problem+json');
      expect((await technician.send('POST', '/v1/readings/import', { body: 'a,b\n', headers: { 'content-type': 'text/csv; charset=latin1' } })).status).toBe(415);
      expect((await postCsv(viewer, csvOf([HEADER]))).status).toBe(403);
    }));
});
