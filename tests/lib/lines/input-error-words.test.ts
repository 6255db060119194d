import { describe, expect, it } from 'vitest';
import { assertLineInput, HydraulicsInputError, type LineInput } from '../../../hydraulics/index';
import { inputErrorText } from '../../../lib/lines/input-error-words';

function refusal(input: LineInput): HydraulicsInputError {
  try {
    assertLineInput(input);
  } catch (error) {
    if (error instanceof HydraulicsInputError) return error;
    throw error;
  }
  throw new Error('expected a refusal');
}

const base: LineInput = {
  stations: [
    { chainageM: 0, groundElevationM: 100 },
    { chainageM: 1399.9999999999998, groundElevationM: 80 },
  ],
  stretches: [{ fromM: 0, toM: 1399.9999999999998, pipe: 'pe100-iso4427-sdr11-50mm' }],
  start: { kind: 'water-level', levelM: 101 },
  end: { kind: 'free-discharge' },
  flow: { kind: 'design', flowM3s: 0.001 },
};

describe("refusals of a design speak the screen's names and the project's units", () => {
  it('a device off the line: no internal field path, no metres with thirteen decimals, feet for a US project', () => {
    const error = refusal({ ...base, devices: [{ kind: 'air-release-valve', chainageM: 1500.1234567891 }] });
    expect(error.message).toMatch(/devices\.chainageM\[0\]/); // the core's own words stay for logs
    const us = inputErrorText(error, 'us');
    // 1,500.12 m = 4,922 ft; 1,400 m = 4,593 ft (1 ft = 0.3048 m, core.md §7).
    expect(us).toBe('Device 1: chainage: ch. 4,922 ft lies outside the line (ch. 0 ft to 4,593 ft)');
    expect(inputErrorText(error, 'metric')).toBe(
      'Device 1: chainage: ch. 1,500.1 m lies outside the line (ch. 0.0 m to 1,400.0 m)',
    );
  });

  it("other refusals keep the core's reason under the on-screen name", () => {
    const error = refusal({ ...base, fittings: [{ chainageM: 10, k: -1 }] });
    expect(inputErrorText(error, 'metric')).toMatch(/^Fitting 1: loss coefficient K: /);
  });
});
