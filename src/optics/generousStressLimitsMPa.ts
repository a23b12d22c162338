/**
 * A generous upper bound on the principal stress difference a model of each material family can
 * carry without breaking or yielding, in MPa: about twice the family's compressive strength at
 * room temperature (tensile strength is lower still). It only has to separate readings that can
 * be right from typing slips, so it is set well above any stress a sound test reaches.
 * Strengths recalled from memory [M] (typical handbook ranges, not a datasheet):
 * polycarbonate compressive yield ~ 80–90 MPa; anhydride-cured epoxy compressive ~ 120–150 MPa;
 * cast acrylic compressive ~ 100–125 MPa; allyl diglycol carbonate compressive ~ 60–75 MPa
 * (tensile ~ 35–45); polyurethane rubber tensile ~ 20–30 MPa; soda-lime glass compressive
 * ~ 500–1000 MPa. 'other' has no bound: the lab knows its material and the schema's range applies.
 */
export const GENEROUS_STRESS_LIMITS_MPA: Readonly<Record<string, number>> = {
  polycarbonate: 180,
  anhydride_cured_epoxy: 300,
  cast_acrylic: 250,
  allyl_diglycol_carbonate: 150,
  polyurethane_rubber: 60,
  soda_lime_glass: 2000,
};
