/** One named colour of the dark-field white-light isochromatic sequence. */
export interface NamedIsochromatic {
  name: string;
  retardationNm: number;
  /** Fringe order at 577 nm as the table gives it. */
  fringeOrder: number;
}

/**
 * The trade's names for the dark-field isochromatic colours in white light, with the
 * retardation each is read as. Source: the isochromatic colour table of Dally & Riley,
 * Experimental Stress Analysis [from memory, not re-read]. Beyond about N = 3 the colours wash
 * out and names stop being useful.
 */
export const isochromaticNamedSequence: readonly NamedIsochromatic[] = [
  { name: 'black', retardationNm: 0, fringeOrder: 0 },
  { name: 'grey', retardationNm: 160, fringeOrder: 0.28 },
  { name: 'white', retardationNm: 260, fringeOrder: 0.45 },
  { name: 'pale yellow', retardationNm: 350, fringeOrder: 0.6 },
  { name: 'orange', retardationNm: 460, fringeOrder: 0.79 },
  { name: 'dull red', retardationNm: 520, fringeOrder: 0.9 },
  { name: 'purple, tint of passage', retardationNm: 577, fringeOrder: 1 },
  { name: 'deep blue', retardationNm: 620, fringeOrder: 1.08 },
  { name: 'blue-green', retardationNm: 700, fringeOrder: 1.22 },
  { name: 'green-yellow', retardationNm: 800, fringeOrder: 1.39 },
  { name: 'orange', retardationNm: 940, fringeOrder: 1.63 },
  { name: 'rose red', retardationNm: 1050, fringeOrder: 1.82 },
  { name: 'purple, tint of passage', retardationNm: 1150, fringeOrder: 2 },
  { name: 'green', retardationNm: 1350, fringeOrder: 2.35 },
  { name: 'green-yellow', retardationNm: 1450, fringeOrder: 2.5 },
  { name: 'red', retardationNm: 1550, fringeOrder: 2.65 },
  { name: 'red/green transition', retardationNm: 1730, fringeOrder: 3 },
  { name: 'green', retardationNm: 1800, fringeOrder: 3.1 },
];
