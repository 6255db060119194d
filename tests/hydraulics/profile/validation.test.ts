import { describe, expect, it } from 'vitest';
import { analyzeLine, assertLineInput, type LineInput } from '../../../hydraulics/index';
import { inputErrorOf, simpleLine, testPipe } from './fixtures';

function base(): LineInput {
  return simpleLine(
    [
      [0, 100],
      [100, 95],
      [200, 90],
    ],
    110,
    0.002,
  );
}

/** Mutates a fresh copy of the base line and returns the error analyzeLine throws for it. */
function errorFor(change: (line: LineInput & Record<string, unknown>) => void) {
  const line = structuredClone(base()) as LineInput & Record<string, unknown>;
  change(line);
  expect(() => assertLineInput(line)).toThrow();
  return inputErrorOf(() => analyzeLine(line));
}

describe('assertLineInput / analyzeLine bad input', () => {
  it('accepts the base line', () => {
    expect(() => assertLineInput(base())).not.toThrow();
  });

  it('zero or one station -> stations', () => {
    for (const count of [0, 1]) {
      const error = errorFor((line) => {
        line.stations = line.stations.slice(0, count);
      });
      expect(error.field).toBe('stations');
      expect(error.index).toBeUndefined();
    }
  });

  it('non-increasing chainage -> stations.chainageM at the offending station', () => {
    const error = errorFor((line) => {
      (line.stations[2] as { chainageM: number }).chainageM = 100;
    });
    expect(error.field).toBe('stations.chainageM');
    expect(error.index).toBe(2);
  });

  it('NaN or infinite values -> the field and index', () => {
    const nan = errorFor((line) => {
      (line.stations[1] as { groundElevationM: number }).groundElevationM = Number.NaN;
    });
    expect([nan.field, nan.index]).toEqual(['stations.groundElevationM', 1]);
    const infinite = errorFor((line) => {
      (line.stations[0] as { chainageM: number }).chainageM = -Infinity;
    });
    expect([infinite.field, infinite.index]).toEqual(['stations.chainageM', 0]);
    const flow = errorFor((line) => {
      line.flow = { kind: 'design', flowM3s: Number.POSITIVE_INFINITY };
    });
    expect([flow.field, flow.index]).toEqual(['flow.flowM3s', undefined]);
  });

  it('negative cover, stretch length or diameter -> the field and index', () => {
    const cover = errorFor((line) => {
      (line.stations[1] as { coverM?: number }).coverM = -0.5;
    });
    expect([cover.field, cover.index]).toEqual(['stations.coverM', 1]);
    const length = errorFor((line) => {
      line.stretches = [
        { fromM: 0, toM: 120, pipe: testPipe() },
        { fromM: 120, toM: 110, pipe: testPipe() },
      ];
    });
    expect([length.field, length.index]).toEqual(['stretches.toM', 1]);
    const diameter = errorFor((line) => {
      line.stretches = [{ fromM: 0, toM: 200, pipe: testPipe({ insideDiameterM: -0.1 }) }];
    });
    expect([diameter.field, diameter.index]).toEqual(['stretches.pipe.insideDiameterM', 0]);
  });

  it('stretches with a gap, an overlap or a short end -> the stretch that breaks the cover', () => {
    const gap = errorFor((line) => {
      line.stretches = [
        { fromM: 0, toM: 90, pipe: testPipe() },
        { fromM: 100, toM: 200, pipe: testPipe() },
      ];
    });
    expect([gap.field, gap.index]).toEqual(['stretches.fromM', 1]);
    expect(gap.message).toMatch(/gap of 10 m/);
    const overlap = errorFor((line) => {
      line.stretches = [
        { fromM: 0, toM: 110, pipe: testPipe() },
        { fromM: 100, toM: 200, pipe: testPipe() },
      ];
    });
    expect([overlap.field, overlap.index]).toEqual(['stretches.fromM', 1]);
    const short = errorFor((line) => {
      line.stretches = [{ fromM: 0, toM: 150, pipe: testPipe() }];
    });
    expect([short.field, short.index]).toEqual(['stretches.toM', 0]);
    const late = errorFor((line) => {
      line.stretches = [{ fromM: 5, toM: 200, pipe: testPipe() }];
    });
    expect([late.field, late.index]).toEqual(['stretches.fromM', 0]);
  });

  it('an unknown pipe id -> stretches.pipe at that stretch', () => {
    const error = errorFor((line) => {
      line.stretches = [
        { fromM: 0, toM: 100, pipe: 'pvc-d2241-sdr21-2in' },
        { fromM: 100, toM: 200, pipe: 'no-such-pipe' },
      ];
    });
    expect([error.field, error.index]).toEqual(['stretches.pipe', 1]);
    expect(error.message).toMatch(/no-such-pipe/);
  });

  it("resolves an id from the line's own pipes before the catalogue", () => {
    const line = {
      ...base(),
      pipes: [testPipe({ id: 'my-pipe' })],
      stretches: [{ fromM: 0, toM: 200, pipe: 'my-pipe' }],
    };
    expect(analyzeLine(line).stretches[0].pipe.id).toBe('my-pipe');
  });

  it('fittings and devices off the line, unknown kinds, bad settings -> the field and index', () => {
    const fitting = errorFor((line) => {
      line.fittings = [
        { chainageM: 50, k: 1 },
        { chainageM: 250, k: 1 },
      ];
    });
    expect([fitting.field, fitting.index]).toEqual(['fittings.chainageM', 1]);
    const k = errorFor((line) => {
      line.fittings = [{ chainageM: 50, k: -1 }];
    });
    expect([k.field, k.index]).toEqual(['fittings.k', 0]);
    const device = errorFor((line) => {
      (line as Record<string, unknown>).devices = [{ kind: 'pump-station', chainageM: 10 }];
    });
    expect([device.field, device.index]).toEqual(['devices.kind', 0]);
    const velocity = errorFor((line) => {
      line.settings = { velocityMinMs: 2, velocityMaxMs: 1 };
    });
    expect(velocity.field).toBe('settings.velocityMaxMs');
    const temperature = errorFor((line) => {
      line.settings = { waterTemperatureC: 90 };
    });
    expect(temperature.field).toBe('settings.waterTemperatureC');
    const start = errorFor((line) => {
      line.start = { kind: 'water-level', levelM: Number.NaN };
    });
    expect(start.field).toBe('start.levelM');
    const end = errorFor((line) => {
      line.end = { kind: 'outlet', elevationM: 90, residualHeadM: -3 };
    });
    expect(end.field).toBe('end.residualHeadM');
  });

  it('does not change the input it analyses', () => {
    const line = base();
    const copy = structuredClone(line);
    analyzeLine({ ...line, devices: [{ kind: 'break-pressure-tank', chainageM: 150 }] });
    expect(line).toEqual(copy);
  });
});
