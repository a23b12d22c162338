/**
 * The invented demo lab: a notch residual study on polycarbonate sheet from two lots, one of
 * which (lot B, sawn and fly-cut) comes out visibly worse, an epoxy casting, and one stored
 * model whose machined edge is slowly building time-edge fringes. Every number here is made
 * up for the demonstration; none is a measurement.
 */
export interface DemoReading {
  stage: 'before_load' | 'under_load' | 'after_unload' | 'before_anneal' | 'after_anneal' | 'inspection';
  /** Hours after the model's machining. */
  atHours: number;
  /** Tardy reading: whole order below and analyzer angle in degrees (fringe n moved to the point). */
  tardy?: [number, number];
  wholeOrder?: number;
  loadN?: number;
  sign?: 'positive' | 'negative' | 'unknown';
}

export interface DemoSite {
  label: string;
  kind: 'notch_root' | 'machined_edge';
  readings: DemoReading[];
}

export interface DemoModel {
  code: string;
  batch: string;
  geometryKind: 'opposite_rounded_notches' | 'opposite_sharp_sawn_notches' | 'sharp_notches_with_relief_notches' | 'compact_tension' | 'calibration_disk';
  thicknessMm: number;
  grossWidthMm?: number;
  netWidthMm?: number;
  notchDepthMm?: number;
  notchRootRadiusMm?: number;
  machiningMethod: string;
  tool: string;
  /** Days before now that the model was machined. */
  machinedDaysAgo: number;
  sites: DemoSite[];
}

export const DEMO_LAB_NAME = 'Demo lab: notch residual study';

export const DEMO_OPERATORS = ['R. Okafor', 'M. Lindqvist', 'T. Haddad'];

export const DEMO_BATCHES = [
  { code: 'PC-LOT-A', material: 'Polycarbonate sheet (catalogue)', kind: 'sheet_lot', supplierLot: 'A-2026-031' },
  { code: 'PC-LOT-B', material: 'Polycarbonate sheet (catalogue)', kind: 'sheet_lot', supplierLot: 'B-2026-044' },
  { code: 'EP-CAST-03', material: 'Anhydride-cured epoxy, cast (catalogue)', kind: 'cast_batch' },
] as const;

const notched = { grossWidthMm: 40, netWidthMm: 24, notchDepthMm: 8 };

/** Four stages at a notch root: residual, peak under load, set after unloading. */
function loadCycle(residual: [number, number], peak: number, loadN: number, after: [number, number]): DemoReading[] {
  return [
    { stage: 'before_load', atHours: 20, tardy: residual },
    { stage: 'under_load', atHours: 21, wholeOrder: peak, loadN },
    { stage: 'after_unload', atHours: 22, tardy: after },
  ];
}

export const DEMO_MODELS: DemoModel[] = [
  { code: 'UN-A1', batch: 'PC-LOT-A', geometryKind: 'opposite_rounded_notches', thicknessMm: 6.02, ...notched, notchRootRadiusMm: 4, machiningMethod: 'milling', tool: '6 mm two-flute end mill, new', machinedDaysAgo: 30,
    sites: [
      { label: 'upper notch root', kind: 'notch_root', readings: loadCycle([0, 18], 7, 600, [0, 27]) },
      { label: 'lower notch root', kind: 'notch_root', readings: loadCycle([0, 16], 7, 600, [0, 25]) },
    ] },
  { code: 'UN-A2', batch: 'PC-LOT-A', geometryKind: 'opposite_rounded_notches', thicknessMm: 5.98, ...notched, notchRootRadiusMm: 4, machiningMethod: 'milling', tool: '6 mm two-flute end mill, new', machinedDaysAgo: 28,
    sites: [
      { label: 'upper notch root', kind: 'notch_root', readings: loadCycle([0, 20], 7, 600, [0, 29]) },
      { label: 'lower notch root', kind: 'notch_root', readings: loadCycle([0, 14], 7, 600, [0, 22]) },
    ] },
  { code: 'UN-A3', batch: 'PC-LOT-A', geometryKind: 'opposite_rounded_notches', thicknessMm: 6.05, ...notched, notchRootRadiusMm: 2, machiningMethod: 'milling', tool: '6 mm two-flute end mill, new', machinedDaysAgo: 25,
    sites: [{ label: 'upper notch root', kind: 'notch_root', readings: loadCycle([0, 22], 9, 600, [0, 40]) }] },
  { code: 'SN-B1', batch: 'PC-LOT-B', geometryKind: 'opposite_sharp_sawn_notches', thicknessMm: 6.1, ...notched, notchRootRadiusMm: 0.25, machiningMethod: 'band saw', tool: '14 tpi blade, worn', machinedDaysAgo: 21,
    sites: [
      { label: 'upper notch root', kind: 'notch_root', readings: [
        { stage: 'before_anneal', atHours: 4, tardy: [0, 95] },
        { stage: 'after_anneal', atHours: 60, tardy: [0, 14] },
        ...loadCycle([0, 14], 12, 400, [0, 50]),
      ] },
      { label: 'lower notch root', kind: 'notch_root', readings: [
        { stage: 'before_anneal', atHours: 4, tardy: [0, 104] },
        { stage: 'after_anneal', atHours: 60, tardy: [0, 19] },
      ] },
    ] },
  { code: 'SN-B2', batch: 'PC-LOT-B', geometryKind: 'opposite_sharp_sawn_notches', thicknessMm: 6.08, ...notched, notchRootRadiusMm: 0.25, machiningMethod: 'band saw', tool: '14 tpi blade, worn', machinedDaysAgo: 18,
    sites: [
      { label: 'upper notch root', kind: 'notch_root', readings: [{ stage: 'before_load', atHours: 6, tardy: [0, 88] }] },
      { label: 'lower notch root', kind: 'notch_root', readings: [{ stage: 'before_load', atHours: 6, tardy: [0, 112] }] },
    ] },
  { code: 'RN-B3', batch: 'PC-LOT-B', geometryKind: 'sharp_notches_with_relief_notches', thicknessMm: 6.04, ...notched, notchRootRadiusMm: 0.25, machiningMethod: 'fly cutter', tool: 'single-point fly cutter', machinedDaysAgo: 15,
    sites: [{ label: 'main notch root', kind: 'notch_root', readings: [{ stage: 'before_load', atHours: 8, tardy: [0, 70] }] }] },
  { code: 'ST-A4', batch: 'PC-LOT-A', geometryKind: 'opposite_rounded_notches', thicknessMm: 6.0, ...notched, notchRootRadiusMm: 4, machiningMethod: 'milling', tool: '6 mm two-flute end mill, new', machinedDaysAgo: 20,
    sites: [{ label: 'machined edge, mid-length', kind: 'machined_edge', readings: [
      { stage: 'inspection', atHours: 2, tardy: [0, 5] },
      { stage: 'inspection', atHours: 24, tardy: [0, 9] },
      { stage: 'inspection', atHours: 72, tardy: [0, 13] },
      { stage: 'inspection', atHours: 168, tardy: [0, 18] },
      { stage: 'inspection', atHours: 336, tardy: [0, 24] },
      { stage: 'inspection', atHours: 470, tardy: [0, 28] },
    ] }] },
  { code: 'CT-E1', batch: 'EP-CAST-03', geometryKind: 'compact_tension', thicknessMm: 9.5, machiningMethod: 'milling', tool: '4 mm carbide end mill', machinedDaysAgo: 10,
    sites: [{ label: 'crack-starter notch root', kind: 'notch_root', readings: [{ stage: 'before_load', atHours: 30, tardy: [0, 11], sign: 'positive' }] }] },
  { code: 'DISK-E1', batch: 'EP-CAST-03', geometryKind: 'calibration_disk', thicknessMm: 9.5, machiningMethod: 'lathe', tool: 'polished carbide insert', machinedDaysAgo: 9, sites: [] },
];
