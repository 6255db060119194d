import { PRESSURE_CAUTION } from '../../hydraulics/index';

/**
 * The cautions every line screen and report carries. Figures that can hurt someone are estimates;
 * the words defer to local codes, the pipe maker's data and a competent person.
 */
export const LINE_CAUTIONS: readonly { title: string; text: string }[] = [
  {
    title: 'Pressure',
    text: `Static and flowing pressures, pipe ratings and allowed heads are estimates from published formulas and catalogue tables. ${PRESSURE_CAUTION}`,
  },
  {
    title: 'Surge',
    text: 'A valve, float or tap shut quickly sends a pressure wave through the line (water hammer) that can burst pipe rated for the static pressure. Close valves slowly; where this report warns of surge, have it checked by a competent person before the line is filled.',
  },
  {
    title: 'Trenching',
    text: 'Trenches can collapse without warning. Follow local rules for digging, shoring and access, locate buried services before digging, and lay pipe at the cover your climate and local codes require.',
  },
  {
    title: 'Drinking water',
    text: 'Water for drinking needs a protected source, pipe and fittings approved for drinking water, and testing; treat it where tests or local rules call for it. These estimates do not show that water is safe to drink.',
  },
];

/** One line for screens with little room. */
export const SHORT_CAUTION =
  'Estimates only: check pressures, ratings and surge against local codes and the pipe maker\u2019s data, and have a competent person review the design before building.';
