import { unitOf, type UnitSystem } from './quantities';

/** The unit symbols one project shows, for headings and input labels (values are stored in SI). */
export interface DisplayUnits {
  system: UnitSystem;
  /** Chainage, elevation, cover. */
  length: string;
  head: string;
  pressure: string;
  /** A line's design flow. */
  flow: string;
  /** Pipe diameters. */
  diameter: string;
  velocity: string;
}

function labelsOf(system: UnitSystem): DisplayUnits {
  return {
    system,
    length: unitOf('length', system),
    head: unitOf('head', system),
    pressure: unitOf('pressure', system),
    flow: unitOf('designFlow', system),
    diameter: unitOf('diameter', system),
    velocity: unitOf('velocity', system),
  };
}

const LABELS: Record<UnitSystem, DisplayUnits> = { metric: labelsOf('metric'), us: labelsOf('us') };

/** Metric: m, L/s, kPa and m of head. US customary: ft, US gpm, psi and ft of head. */
export function displayUnits(system: UnitSystem): DisplayUnits {
  return LABELS[system];
}

/** How a unit system is named to people: "Metric (m, L/s, kPa)". */
export function unitSystemName(system: UnitSystem): string {
  const u = LABELS[system];
  return `${system === 'us' ? 'US customary' : 'Metric'} (${u.length}, ${u.flow}, ${u.pressure})`;
}
