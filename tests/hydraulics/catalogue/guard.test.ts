import { describe, expect, it } from 'vitest';
import { assertPipeSpec, findPipe, type PipeSpec } from '../../../hydraulics/catalogue';
import { HydraulicsInputError } from '../../../hydraulics/errors';

const base: PipeSpec = { ...findPipe('pe100-iso4427-sdr11-63mm')! };

function errorOf(value: unknown, index?: number): HydraulicsInputError {
  try {
    assertPipeSpec(value, 'pipe', index);
  } catch (error) {
    if (error instanceof HydraulicsInputError) return error;
    throw error;
  }
  throw new Error('expected assertPipeSpec to throw');
}

describe('assertPipeSpec', () => {
  it('accepts a custom pipe written as plain data', () => {
    const custom: PipeSpec = {
      ...base,
      id: 'custom-1',
      label: 'Old black poly 1 in',
      material: 'custom',
      source: 'site measurement',
    };
    expect(() => assertPipeSpec(custom)).not.toThrow();
  });
  it.each([
    [null, 'pipe'],
    [{ ...base, id: '' }, 'pipe.id'],
    [{ ...base, material: 'copper' }, 'pipe.material'],
    [{ ...base, insideDiameterM: Number.NaN }, 'pipe.insideDiameterM'],
    [{ ...base, insideDiameterM: -0.05 }, 'pipe.insideDiameterM'],
    [{ ...base, insideDiameterM: 0.07 }, 'pipe.insideDiameterM'],
    [{ ...base, wallM: 0.02 }, 'pipe.wallM'],
    [{ ...base, pressureRatingPa: Number.POSITIVE_INFINITY }, 'pipe.pressureRatingPa'],
    [{ ...base, hazenWilliamsC: 1500 }, 'pipe.hazenWilliamsC'],
    [{ ...base, roughnessM: -1e-6 }, 'pipe.roughnessM'],
    [{ ...base, roughnessM: 0.01 }, 'pipe.roughnessM'],
    [{ ...base, waveSpeedMs: 5000 }, 'pipe.waveSpeedMs'],
    [{ ...base, source: '   ' }, 'pipe.source'],
    [{ ...base, sdr: 1.5 }, 'pipe.sdr'],
    [{ ...base, sidr: 0 }, 'pipe.sidr'],
  ])('rejects %o naming %s', (value, field) => {
    expect(errorOf(value).field).toBe(field);
  });
  it('carries the row index for lists', () => {
    const error = errorOf({ ...base, hazenWilliamsC: 0 }, 3);
    expect(error.index).toBe(3);
    expect(error.message).toBe('pipe.hazenWilliamsC[3]: must be greater than 0, got 0');
  });
});
