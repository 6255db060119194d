import {
  flowFromM3s,
  flowToM3s,
  headFromM,
  headMToPressurePa,
  headToM,
  lengthFromM,
  lengthToM,
  pressureFromPa,
  type FlowUnit,
  type HeadUnit,
  type LengthUnit,
  type PressureUnit,
} from '../../hydraulics/index';

export type UnitSystem = 'metric' | 'us';

/** The units one project shows everything in (values are stored in SI). */
export interface DisplayUnits {
  system: UnitSystem;
  /** Chainage, elevation, cover. */
  length: LengthUnit & ('m' | 'ft');
  head: HeadUnit;
  pressure: PressureUnit;
  flow: FlowUnit;
  /** Pipe diameters. */
  diameter: LengthUnit & ('mm' | 'in');
  velocityLabel: 'm/s' | 'ft/s';
  flowLabel: string;
}

const METRIC: DisplayUnits = { system: 'metric', length: 'm', head: 'm', pressure: 'kPa', flow: 'L/s', diameter: 'mm', velocityLabel: 'm/s', flowLabel: 'L/s' };
const US: DisplayUnits = { system: 'us', length: 'ft', head: 'ft', pressure: 'psi', flow: 'US gpm', diameter: 'in', velocityLabel: 'ft/s', flowLabel: 'gpm' };

/** Metric: m, L/s, kPa and m of head. US customary: ft, gpm, psi and ft of head. */
export function displayUnits(system: UnitSystem): DisplayUnits {
  return system === 'us' ? US : METRIC;
}

/** SI -> display numbers, conversions from the engineering core's unit tables. */
export const toDisplay = {
  length: (m: number, u: DisplayUnits) => lengthFromM(m, u.length),
  head: (m: number, u: DisplayUnits) => headFromM(m, u.head),
  /** Gauge pressure of a head of water at the given temperature. */
  pressureOfHead: (headM: number, u: DisplayUnits, temperatureC?: number) => pressureFromPa(headMToPressurePa(headM, temperatureC), u.pressure),
  pressure: (pa: number, u: DisplayUnits) => pressureFromPa(pa, u.pressure),
  flow: (m3s: number, u: DisplayUnits) => flowFromM3s(m3s, u.flow),
  velocity: (ms: number, u: DisplayUnits) => lengthFromM(ms, u.length),
  diameter: (m: number, u: DisplayUnits) => lengthFromM(m, u.diameter),
};

/** Display numbers -> SI, for what people type into forms. */
export const fromDisplay = {
  length: (v: number, u: DisplayUnits) => lengthToM(v, u.length),
  head: (v: number, u: DisplayUnits) => headToM(v, u.head),
  flow: (v: number, u: DisplayUnits) => flowToM3s(v, u.flow),
  velocity: (v: number, u: DisplayUnits) => lengthToM(v, u.length),
};
