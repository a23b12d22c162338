import { CreateBatchInput, CreateMaterialInput } from '../../db/inputs/materials.ts';
import { CreateEventInput, CreateModelInput, CreateSiteInput } from '../../db/inputs/models.ts';
import { AmendReadingInput, CreateReadingInput } from '../../db/inputs/readings.ts';
import '@hono/zod-openapi';

// Tier 3: the operation inputs as documented, with examples from the project's own demo lab.
export const MaterialInputSchema = CreateMaterialInput.openapi('MaterialInput', {
  example: {
    name: 'Polycarbonate sheet, 6 mm stock',
    family: 'polycarbonate',
    fringeValueNPerMm: 7.0,
    fringeValueUncertaintyNPerMm: 0.35,
    fringeValueWavelengthNm: 577,
    elasticModulusGPa: 2.3,
    poissonRatio: 0.37,
    glassTransitionC: 148,
    sources: { fringeValueNPerMm: { document: 'Dally & Riley, Experimental Stress Analysis, photoelastic materials table', flag: 'from_memory' } },
  },
});

export const BatchInputSchema = CreateBatchInput.openapi('BatchInput', {
  example: { materialId: '0b5f8f7e-3c1d-4b8e-9a43-5f1e2d6c7a90', code: 'PC-2026-07', kind: 'sheet_lot', supplierLot: 'L4471' },
});

export const ModelInputSchema = CreateModelInput.openapi('ModelInput', {
  example: {
    batchId: '0b5f8f7e-3c1d-4b8e-9a43-5f1e2d6c7a90',
    code: 'UN-07',
    geometryKind: 'opposite_rounded_notches',
    thicknessMm: 6.05,
    thicknessUncertaintyMm: 0.02,
    grossWidthMm: 40,
    netWidthMm: 24,
    notchDepthMm: 8,
    notchRootRadiusMm: 4,
  },
});

export const SiteInputSchema = CreateSiteInput.openapi('SiteInput', {
  example: { label: 'upper notch root', kind: 'notch_root', onFreeEdge: true },
});

export const EventInputSchema = CreateEventInput.openapi('EventInput', {
  example: { kind: 'machined', occurredAt: '2026-11-20T09:30:00Z', operator: 'R. Okafor', machiningMethod: 'milling', tool: '6 mm two-flute end mill, new' },
});

export const ReadingInputSchema = CreateReadingInput.openapi('ReadingInput', {
  example: {
    stage: 'before_load',
    observedAt: '2026-11-21T14:05:00Z',
    operator: 'R. Okafor',
    wavelengthNm: 577,
    reading: { method: 'tardy', lowerOrder: 0, analyzerRotationDeg: 27, movedFringe: 'lower' },
    sign: 'unknown',
  },
});

export const AmendmentInputSchema = AmendReadingInput.openapi('ReadingAmendmentInput', {
  example: {
    stage: 'before_load',
    observedAt: '2026-11-21T14:05:00Z',
    operator: 'R. Okafor',
    wavelengthNm: 577,
    reading: { method: 'tardy', lowerOrder: 0, analyzerRotationDeg: 72, movedFringe: 'lower' },
    sign: 'unknown',
    reason: 'Analyzer angle misread: 72°, not 27°, per the bench notebook.',
  },
});
