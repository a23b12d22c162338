/**
 * A value with its standard uncertainty (GUM, coverage factor k = 1), in the unit its
 * owner's name states (e.g. `fringeValueNPerMm: Measured`).
 */
export interface Measured {
  value: number;
  /** Standard uncertainty u(x), same unit as value, never negative. */
  uncertainty: number;
}
