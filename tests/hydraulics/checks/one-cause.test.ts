import { describe, expect, it } from 'vitest';
import { analyzeLine, applyLineFixes, type LineInput } from '../../../hydraulics/index';
import { warningText } from '../../../lib/lines/warning-words';
import { displayUnits } from '../../../lib/units';

/** 1.6 km of 32 mm pipe over a rise at ch. 700 to a trough wanting 10 m of pressure (invented). */
function line(flowM3s: number): LineInput {
  return {
    stations: [
      [0, 200],
      [300, 150],
      [700, 170],
      [1200, 120],
      [1600, 100],
    ].map(([chainageM, groundElevationM]) => ({ chainageM, groundElevationM })),
    stretches: [{ fromM: 0, toM: 1600, pipe: 'pe100-iso4427-sdr11-32mm' }],
    start: { kind: 'water-level', levelM: 201 },
    end: { kind: 'outlet', elevationM: 99, residualHeadM: 10 },
    flow: { kind: 'design', flowM3s },
  };
}

describe('one cause (a pipe too small for the design flow) gives one danger with its one-click fix', () => {
  const capacity = analyzeLine({ ...line(0), flow: { kind: 'find' } }).flowM3s;
  const over = analyzeLine(line(capacity * 1.8));

  it('the suction dangers the flow causes are folded into the one outlet danger, which names the pipe that works', () => {
    const dangers = over.warnings.filter((w) => w.severity === 'danger');
    expect(dangers.map((w) => w.code)).toEqual(['residual-below-target']);
    const [short] = dangers;
    expect(short.fixes).toEqual([{ kind: 'change-pipe', stretchIndex: 0, pipeId: 'pe100-iso4427-sdr11-40mm' }]);
    expect(short.values.alsoClears).toEqual(['siphon-limit', 'vapour-limit']);
    expect(over.warnings.map((w) => w.code)).not.toContain('siphon-limit');
    expect(warningText(short, displayUnits('metric')).fix).toMatch(/clear with it/);
  });

  it('the fold is honest: the one change does clear every folded item', () => {
    const [short] = over.warnings.filter((w) => w.code === 'residual-below-target');
    const fixed = analyzeLine(applyLineFixes(line(capacity * 1.8), short.fixes));
    for (const code of short.values.alsoClears ?? []) expect(fixed.warnings.map((w) => w.code)).not.toContain(code);
    expect(fixed.end.residualHeadM).toBeGreaterThanOrEqual(10);
  });

  it('at a flow the line carries, nothing is folded and there is no outlet danger', () => {
    const fine = analyzeLine(line(capacity * 0.9));
    expect(fine.warnings.map((w) => w.code)).not.toContain('residual-below-target');
    expect(fine.warnings.every((w) => w.values.alsoClears === undefined)).toBe(true);
  });
});
