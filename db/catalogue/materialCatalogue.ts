import type { CreateMaterialInput } from '../inputs/materials.ts';

const DALLY_RILEY = 'Dally & Riley, Experimental Stress Analysis, photoelastic materials table';
const CRAWFORD = 'Crawford, Plastics Engineering, Table 1.8';

/**
 * Catalogue values every new lab starts with (fσ at about 577 nm). Flags follow the project's
 * reference list: 'from_memory' values were recalled, not re-read, and carry a wide
 * uncertainty; a batch's own calibration should replace them.
 */
export const MATERIAL_CATALOGUE: CreateMaterialInput[] = [
  {
    name: 'Polycarbonate sheet (catalogue)',
    family: 'polycarbonate',
    fringeValueNPerMm: 7.0,
    fringeValueUncertaintyNPerMm: 0.5,
    fringeValueWavelengthNm: 577,
    elasticModulusGPa: 2.2,
    poissonRatio: 0.37,
    glassTransitionC: 148,
    thermalExpansionPerMK: 67,
    thermalConductivityWPerMK: 0.2,
    densityKgPerM3: 1200,
    specificHeatJPerKgK: 1250,
    thermalDiffusivityMm2PerS: 0.144,
    sources: {
      fringeValueNPerMm: { document: DALLY_RILEY, flag: 'from_memory' },
      elasticModulusGPa: { document: 'property range 2.0–2.4 GPa', locator: 'project reference list', flag: 'read' },
      glassTransitionC: { document: CRAWFORD, flag: 'read' },
      thermalDiffusivityMm2PerS: { document: 'k/(ρ·cp) from the listed properties', flag: 'read' },
    },
  },
  {
    name: 'Anhydride-cured epoxy, cast (catalogue)',
    family: 'anhydride_cured_epoxy',
    fringeValueNPerMm: 11.0,
    fringeValueUncertaintyNPerMm: 0.6,
    fringeValueWavelengthNm: 577,
    elasticModulusGPa: 3.25,
    poissonRatio: 0.365,
    glassTransitionC: 135,
    thermalExpansionPerMK: 65,
    thermalConductivityWPerMK: 0.23,
    densityKgPerM3: 1200,
    specificHeatJPerKgK: 1125,
    thermalDiffusivityMm2PerS: 0.15,
    sources: {
      fringeValueNPerMm: { document: DALLY_RILEY, locator: '10.5–11.5 kN/m per fringe', flag: 'from_memory' },
      elasticModulusGPa: { document: DALLY_RILEY, flag: 'from_memory' },
      glassTransitionC: { document: 'Tg 130–140 °C', locator: 'project reference list', flag: 'read' },
      thermalDiffusivityMm2PerS: { document: 'k/(ρ·cp) from the listed properties', flag: 'derived' },
    },
  },
  {
    name: 'Cast acrylic sheet (catalogue)',
    family: 'cast_acrylic',
    fringeValueNPerMm: 130,
    fringeValueUncertaintyNPerMm: 15,
    fringeValueWavelengthNm: 577,
    elasticModulusGPa: 3.0,
    poissonRatio: 0.37,
    glassTransitionC: 105,
    thermalExpansionPerMK: 70,
    thermalConductivityWPerMK: 0.2,
    densityKgPerM3: 1180,
    specificHeatJPerKgK: 1500,
    thermalDiffusivityMm2PerS: 0.109,
    sources: {
      fringeValueNPerMm: { document: DALLY_RILEY, flag: 'from_memory' },
      glassTransitionC: { document: CRAWFORD, flag: 'read' },
      thermalDiffusivityMm2PerS: { document: 'k/(ρ·cp) from the listed properties', flag: 'read' },
    },
  },
  {
    name: 'Soda-lime glass (catalogue)',
    family: 'soda_lime_glass',
    fringeValueNPerMm: 220,
    fringeValueUncertaintyNPerMm: 10,
    fringeValueWavelengthNm: 577,
    elasticModulusGPa: 72,
    poissonRatio: 0.22,
    glassTransitionC: 547,
    thermalExpansionPerMK: 8.7,
    thermalConductivityWPerMK: 0.97,
    densityKgPerM3: 2500,
    specificHeatJPerKgK: 800,
    thermalDiffusivityMm2PerS: 0.46,
    sources: {
      fringeValueNPerMm: { document: 'fσ = λ/C with C ≈ 2.6 Br (a float-glass maker\'s technical bulletin; ASTM C770 measures C)', flag: 'derived' },
      glassTransitionC: { document: 'annealing point 546–548 °C', locator: 'project reference list', flag: 'read' },
      thermalDiffusivityMm2PerS: { document: 'k/(ρ·cp) from the listed properties', flag: 'derived' },
    },
  },
];
