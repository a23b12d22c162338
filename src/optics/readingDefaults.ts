// Reference values for turning a reading into a fringe order. Each carries its flag:
// [R] read in the named source, [M] recalled from memory, or common practice.

/**
 * Effective wavelength of white light at the first tint of passage (the purple between red
 * and blue in the dark-field isochromatic sequence), 577 nm. [M: Dally & Riley, Experimental
 * Stress Analysis, isochromatic colour table; also common practice]
 */
export const WHITE_LIGHT_EFFECTIVE_WAVELENGTH_NM = 577;

/** Visible range accepted for a stated wavelength, nm (common practice: 380–780 nm). */
export const VISIBLE_WAVELENGTH_RANGE_NM = { min: 380, max: 780 } as const;

/**
 * Default standard uncertainty of one reading, in fringes, per method, used when the caller
 * gives none. The lab's own repeatability study should replace these.
 */
export const DEFAULT_READING_UNCERTAINTY_FRINGES = {
  // Tardy ±0.01–0.02 fringe [M]; the upper end is taken so a default never flatters a reading.
  tardy: 0.02,
  // Sénarmont works the same way (analyzer rotation against a quarter-wave plate) [M]: as Tardy.
  senarmont: 0.02,
  // Locating a fringe centre by eye and counting it: ±0.1 fringe, common practice.
  whole_order: 0.1,
  // A fractional order read directly, usually by colour by eye: ±0.1–0.2 [M]; the upper end.
  direct: 0.2,
} as const;

/**
 * Scale resolution assumed for a compensator reading, nm (common practice for a graduated
 * compensator; set the instrument's own value through an explicit uncertainty). Turned into
 * a standard uncertainty as a rectangular distribution of full width r: u = r/√12 [M: GUM 4.3.7].
 */
export const DEFAULT_COMPENSATOR_RESOLUTION_NM = 5;
