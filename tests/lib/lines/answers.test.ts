import { describe, expect, it } from 'vitest';
import { analyzeLine, type LineInput } from '../../../hydraulics/index';
import { FRICTION_WORDS, lineAnswers } from '../../../lib/lines/answers';

/** 800 m of 25 mm pipe falling 20 m to a trough that wants 5 m of pressure (invented). */
function line(flowM3s: number): LineInput {
  return {
    stations: [
      { chainageM: 0, groundElevationM: 120 },
      { chainageM: 400, groundElevationM: 110 },
      { chainageM: 800, groundElevationM: 100 },
    ],
    stretches: [{ fromM: 0, toM: 800, pipe: 'pe100-iso4427-sdr11-25mm' }],
    start: { kind: 'water-level', levelM: 121 },
    end: { kind: 'outlet', elevationM: 100, residualHeadM: 5 },
    flow: { kind: 'design', flowM3s },
  };
}

describe('the flow-delivered answer never shows a flow the line cannot carry', () => {
  it('a design flow above what the line carries is flagged, with the most it carries', () => {
    const found = analyzeLine({ ...line(0), flow: { kind: 'find' } });
    const answers = lineAnswers(analyzeLine(line(found.flowM3s * 2)));
    expect(answers.overCapacity).toBe(true);
    // The most it carries is the gravity flow with 5 m left at the trough.
    expect(answers.capacityM3s).toBeCloseTo(found.flowM3s, 9);
    expect(answers.endResidualHeadM).toBeLessThan(5);
  });

  it('a design flow the line carries is not flagged; a found flow never is', () => {
    const found = analyzeLine({ ...line(0), flow: { kind: 'find' } });
    expect(lineAnswers(analyzeLine(line(found.flowM3s * 0.9))).overCapacity).toBe(false);
    expect(lineAnswers(found).overCapacity).toBe(false);
  });

  it("a network's flow that drops at a take-off is judged by the end residual, not by the start flow against one-flow capacity", () => {
    const found = analyzeLine({ ...line(0), flow: { kind: 'find' } });
    // Twice the gravity flow for the first 50 m (a take-off there draws most of it), then well below it.
    const scheduled = analyzeLine({
      ...line(0),
      flow: {
        kind: 'schedule',
        pieces: [
          { fromM: 0, flowM3s: found.flowM3s * 2 },
          { fromM: 50, flowM3s: found.flowM3s * 0.5 },
        ],
      },
    });
    const answers = lineAnswers(scheduled);
    expect(answers.scheduled).toBe(true);
    expect(answers.overCapacity).toBe(false);
    expect(answers.endResidualHeadM).toBeGreaterThan(5);
    expect(answers.flowM3s).toBeCloseTo(found.flowM3s * 2, 12);
  });

  it('names the friction formula the figures came from', () => {
    const answers = lineAnswers(analyzeLine(line(0.0002)));
    expect(answers.frictionMethod).toBe('darcy-weisbach');
    expect(FRICTION_WORDS[answers.frictionMethod!]).toMatch(/Darcy-Weisbach with the Colebrook/);
    expect(
      lineAnswers(analyzeLine({ ...line(0.0002), settings: { frictionMethod: 'hazen-williams' } })).frictionMethod,
    ).toBe('hazen-williams');
  });
});
