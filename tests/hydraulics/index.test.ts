import { describe, expect, it } from 'vitest';
import * as hydraulics from '../../hydraulics/index';

/**
 * The public API of the engineering core, by name. Changing it must be deliberate: update this
 * list in the same change. (Types are erased at run time; they are checked by tsc.)
 */
const EXPORTED_NAMES = [
  'ASTM_PRESSURE_CLASSES_PSI',
  'BAR_PA',
  'DEFAULT_LINE_SETTINGS',
  'DEFAULT_WATER_TEMPERATURE_C',
  'FITTING_LOSS_COEFFICIENTS',
  'FLOW_UNITS_M3S',
  'FOOT_M',
  'GRAVITY_MS2',
  'HEAD_UNITS_M',
  'HydraulicsInputError',
  'IMPERIAL_GALLON_M3',
  'INCH_M',
  'ISO_PRESSURE_CLASSES_BAR',
  'LENGTH_UNITS_M',
  'MATERIAL_GRADES',
  'PIPE_CATALOGUE',
  'PIPE_SERIES',
  'PIPE_SERIES_IDS',
  'POUND_KG',
  'PRESSURE_CAUTION',
  'PRESSURE_UNITS_PA',
  'PSI_PA',
  'SECONDS_PER_DAY',
  'STANDARD_ATMOSPHERE_PA',
  'US_GALLON_M3',
  'WATER_BULK_MODULUS_PA',
  'WATER_TEMPERATURE_MAX_C',
  'WATER_TEMPERATURE_MIN_C',
  'analyzeLine',
  'analyzeProfile',
  'applyLineFixes',
  'assertLineInput',
  'assertPipeSpec',
  'atmosphericHeadM',
  'atmosphericPressurePa',
  'colebrookFrictionFactor',
  'criticalClosureTimeS',
  'darcyFrictionFactor',
  'darcyWeisbachHeadLoss',
  'deratedPressureRatingPa',
  'findLimitRanges',
  'findPipe',
  'findTurningPoints',
  'flowForHeadLoss',
  'flowFromM3s',
  'flowToM3s',
  'hazenWilliamsFlowM3s',
  'hazenWilliamsHeadLoss',
  'headFromM',
  'headMToPressurePa',
  'headToM',
  'joukowskyHeadRise',
  'kortewegWaveSpeedMs',
  'lengthFromM',
  'lengthToM',
  'meanVelocityMs',
  'minorLossHeadM',
  'nextSizeInSeries',
  'nominalPressureClass',
  'pipeAreaM2',
  'pipeHeadLossM',
  'pipesOfSeries',
  'planBreakPressureTanks',
  'plasticDeratingFactor',
  'pressureFromPa',
  'pressurePaToHeadM',
  'pressureRatingFromSdr',
  'pressureRatingFromSidr',
  'pressureToPa',
  'profileRows',
  'ratingReferenceTemperatureC',
  'resolveLineSettings',
  'seriesCriticalClosureTimeS',
  'smallestPipeForFlow',
  'suddenExpansionLossCoefficient',
  'suggestBreakPressureTanks',
  'suggestPipeUpsize',
  'swameeJainFrictionFactor',
  'totalLossCoefficient',
  'vapourHeadM',
  'waterDensityKgM3',
  'waterDynamicViscosityPaS',
  'waterKinematicViscosityM2s',
  'waterVapourPressurePa',
];

describe('hydraulics/index.ts', () => {
  it('exports exactly the listed names', () => {
    expect(Object.keys(hydraulics).sort()).toEqual(EXPORTED_NAMES);
  });

  it('keeps the list sorted so a diff shows the change', () => {
    expect([...EXPORTED_NAMES].sort()).toEqual(EXPORTED_NAMES);
  });

  it('exports the named entry points as functions', () => {
    for (const name of ['hazenWilliamsHeadLoss', 'darcyWeisbachHeadLoss', 'colebrookFrictionFactor', 'swameeJainFrictionFactor',
      'joukowskyHeadRise', 'pressureRatingFromSdr', 'analyzeLine', 'assertLineInput'] as const) {
      expect(typeof hydraulics[name]).toBe('function');
    }
  });
});
