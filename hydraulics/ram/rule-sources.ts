/** Sources of the ram rules, named as docs/references/core.md lists them. */
export const WATER_FOR_THE_WORLD =
  'Water for the World, Technical Note RWS.4.D.5 Designing a Hydraulic Ram Pump (USAID)';
export const USDA_BULLETIN = 'USDA Farmers\' Bulletin "Water Supply, Plumbing, etc., for Country Homes", p.27';
export const CLEMSON = 'Clemson Univ. (W. Bryan Smith) "Home-made Hydraulic Ram Pump" and installation sketches (2003)';
export const NO_SOURCE = 'common practice, no source';

/** A head in metres to one decimal, for messages. */
export const metres = (value: number): string => value.toFixed(1);
