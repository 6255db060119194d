import { FOOT_M, US_GALLON_M3 } from '../../hydraulics/index';
import type { UnitSystem } from './quantities';

/**
 * What a new line, network part or form starts with in each unit system, so a US project never opens
 * on ISO pipe and metre round numbers (docs/references/profile-and-checks.md §7.1). Values stay SI.
 */
export interface UnitDefaults {
  /** Pipe series pickers open on. */
  pipeSeriesId: string;
  /** The pipe a new line is laid with. */
  linePipeId: string;
  /** The pipe a new network link gets (a service-sized bore). */
  networkPipeId: string;
  /** The example in an empty design-flow box (never saved), m³/s: 1 L/s, or 15 US gpm (a round figure near it). */
  designFlowM3s: number;
  /** Cover where the survey gives none, m: 0.75 m, or 2.5 ft in feet. */
  coverM: number;
  /** Water temperature, °C (20 °C is 68 °F exactly). */
  waterTemperatureC: number;
  /** Per-person daily use figure a new demand starts with (hydraulics/demand/per-person-figures.ts). */
  perPersonFigureId: string;
  /**
   * Decimal mark a new project reads typed numbers with: a point in a US project; a metric one follows the browser's
   * language (null).
   */
  decimalMark: '.' | null;
}

const DEFAULTS: Record<UnitSystem, UnitDefaults> = {
  metric: {
    pipeSeriesId: 'pe100-iso4427-sdr11',
    linePipeId: 'pe100-iso4427-sdr11-50mm',
    networkPipeId: 'pe100-iso4427-sdr11-32mm',
    designFlowM3s: 0.001,
    coverM: 0.75,
    waterTemperatureC: 20,
    perPersonFigureId: 'most-needs',
    decimalMark: null,
  },
  us: {
    pipeSeriesId: 'pe-d2239-sidr7',
    linePipeId: 'pe-d2239-sidr7-1.5in',
    networkPipeId: 'pe-d2239-sidr7-1in',
    designFlowM3s: (15 * US_GALLON_M3) / 60,
    coverM: 2.5 * FOOT_M,
    waterTemperatureC: 20,
    perPersonFigureId: 'us-rural-home',
    decimalMark: '.',
  },
};

export function unitDefaults(system: UnitSystem): UnitDefaults {
  return DEFAULTS[system];
}
