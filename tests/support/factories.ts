import type { Client } from './client.ts';

let sequence = 0;
const unique = (prefix: string) => `${prefix}-${process.pid}-${++sequence}`;

async function created(client: Client, path: string, body: unknown) {
  const reply = await client.post(path, body);
  if (reply.status !== 201) throw new Error(`factory POST ${path} answered ${reply.status}: ${reply.text}`);
  return reply.body;
}

/** Builders of valid records with unique codes, each overridable field by field. */
export function factoriesFor(admin: Client) {
  const material = async (over: Record<string, unknown> = {}) =>
    created(admin, '/v1/materials', { name: unique('material'), family: 'polycarbonate', fringeValueNPerMm: 7, fringeValueUncertaintyNPerMm: 0.3, fringeValueWavelengthNm: 577, ...over });
  const batch = async (over: Record<string, unknown> = {}) => {
    const materialId = (over.materialId as string | undefined) ?? (await material()).id;
    return created(admin, '/v1/batches', { code: unique('batch'), kind: 'sheet_lot', ...over, materialId });
  };
  const model = async (over: Record<string, unknown> = {}) => {
    const batchId = (over.batchId as string | undefined) ?? (await batch()).id;
    return created(admin, '/v1/models', {
      code: unique('model'),
      geometryKind: 'opposite_rounded_notches',
      thicknessMm: 6,
      grossWidthMm: 40,
      netWidthMm: 24,
      notchDepthMm: 8,
      notchRootRadiusMm: 4,
      ...over,
      batchId,
    });
  };
  const site = async (over: Record<string, unknown> = {}) => {
    const modelId = (over.modelId as string | undefined) ?? (await model()).id;
    const { modelId: _ignored, ...rest } = over;
    return created(admin, `/v1/models/${modelId}/sites`, { label: unique('site'), kind: 'notch_root', onFreeEdge: true, ...rest });
  };
  const reading = async (siteId: string, over: Record<string, unknown> = {}) =>
    created(admin, `/v1/sites/${siteId}/readings`, {
      stage: 'before_load',
      observedAt: '2026-11-21T14:05:00Z',
      operator: 'test operator',
      wavelengthNm: 577,
      reading: { method: 'tardy', lowerOrder: 0, analyzerRotationDeg: 36, movedFringe: 'lower' },
      ...over,
    });
  return { material, batch, model, site, reading };
}

export type Factories = ReturnType<typeof factoriesFor>;
