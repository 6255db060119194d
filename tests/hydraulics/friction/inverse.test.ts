import { describe, expect, it } from 'vitest';
import { findPipe, pipesOfSeries } from '../../../hydraulics/catalogue';
import { pipeHeadLossM } from '../../../hydraulics/friction/head-loss';
import { flowForHeadLoss, smallestPipeForFlow } from '../../../hydraulics/friction/inverse';

const pipe = findPipe('pvc-d2241-sdr21-2in')!;

describe('flowForHeadLoss', () => {
  it.each([
    ['hazen-williams', 25],
    ['darcy-weisbach', 25],
    ['darcy-weisbach', 1e-4], // laminar
  ] as const)('%s: loss %d m over 400 m inverts pipeHeadLossM', (method, headLossM) => {
    const flow = flowForHeadLoss({ method, headLossM, lengthM: 400, pipe });
    expect(pipeHeadLossM({ method, flowM3s: flow, lengthM: 400, pipe })).toBeCloseTo(headLossM, 9);
  });
  it('Darcy-Weisbach in the 2000-4000 transition band (bisection)', () => {
    // Re 3000 in this pipe at 20 °C.
    const flowAtRe3000 = (3000 * 1.0038e-6 * Math.PI * pipe.insideDiameterM) / 4;
    const loss = pipeHeadLossM({ method: 'darcy-weisbach', flowM3s: flowAtRe3000, lengthM: 400, pipe });
    const flow = flowForHeadLoss({ method: 'darcy-weisbach', headLossM: loss, lengthM: 400, pipe });
    expect(flow).toBeCloseTo(flowAtRe3000, 12);
  });
  it('is sign-aware and zero at zero loss', () => {
    const forward = flowForHeadLoss({ method: 'darcy-weisbach', headLossM: 3, lengthM: 100, pipe });
    expect(flowForHeadLoss({ method: 'darcy-weisbach', headLossM: -3, lengthM: 100, pipe })).toBe(-forward);
    expect(flowForHeadLoss({ method: 'hazen-williams', headLossM: 0, lengthM: 100, pipe })).toBe(0);
  });
  it('rejects bad input naming the field', () => {
    expect(() => flowForHeadLoss({ method: 'hazen-williams', headLossM: Number.NaN, lengthM: 100, pipe })).toThrow(
      /headLossM/,
    );
    expect(() => flowForHeadLoss({ method: 'hazen-williams', headLossM: 1, lengthM: 0, pipe })).toThrow(/lengthM/);
    expect(() =>
      flowForHeadLoss({ method: 'hazen-williams', headLossM: 1, lengthM: 10, pipe: { ...pipe, hazenWilliamsC: -1 } }),
    ).toThrow(/pipe.hazenWilliamsC/);
  });
});

describe('smallestPipeForFlow', () => {
  const series = pipesOfSeries('pvc-d2241-sdr21');

  it('picks the smallest size within the head budget, and the next one is not needlessly big', () => {
    const result = smallestPipeForFlow({
      method: 'hazen-williams',
      flowM3s: 0.003,
      lengthM: 1000,
      headBudgetM: 20,
      candidates: series,
    })!;
    expect(result.headLossM).toBeLessThanOrEqual(20);
    const smaller = series.filter((candidate) => candidate.insideDiameterM < result.pipe.insideDiameterM);
    for (const candidate of smaller) {
      expect(
        pipeHeadLossM({ method: 'hazen-williams', flowM3s: 0.003, lengthM: 1000, pipe: candidate }),
      ).toBeGreaterThan(20);
    }
    expect(result.velocityMs).toBeCloseTo(0.003 / (0.25 * Math.PI * result.pipe.insideDiameterM ** 2), 12);
  });
  it('counts fitting losses against the budget', () => {
    const plain = smallestPipeForFlow({
      method: 'darcy-weisbach',
      flowM3s: 0.002,
      lengthM: 50,
      headBudgetM: 2,
      candidates: series,
    })!;
    const withFittings = smallestPipeForFlow({
      method: 'darcy-weisbach',
      flowM3s: 0.002,
      lengthM: 50,
      headBudgetM: 2,
      candidates: series,
      kTotal: 60,
    })!;
    expect(withFittings.pipe.insideDiameterM).toBeGreaterThan(plain.pipe.insideDiameterM);
  });
  it('returns undefined when nothing fits and does not reorder the caller’s list', () => {
    const reversed = [...series].reverse();
    const before = reversed.map((candidate) => candidate.id);
    expect(
      smallestPipeForFlow({
        method: 'hazen-williams',
        flowM3s: 1,
        lengthM: 10_000,
        headBudgetM: 1,
        candidates: reversed,
      }),
    ).toBeUndefined();
    expect(reversed.map((candidate) => candidate.id)).toEqual(before);
  });
  it('names a bad candidate by index', () => {
    const bad = [series[0], { ...series[1], insideDiameterM: Number.NaN }];
    expect(() =>
      smallestPipeForFlow({ method: 'hazen-williams', flowM3s: 0.001, lengthM: 10, headBudgetM: 1, candidates: bad }),
    ).toThrow(/candidates.insideDiameterM\[1\]/);
  });
});
