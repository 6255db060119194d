import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { PIPE_CATALOGUE } from '../../../hydraulics/catalogue';
import { pipeHeadLossM, type FrictionMethod } from '../../../hydraulics/friction/head-loss';
import { flowForHeadLoss } from '../../../hydraulics/friction/inverse';

const methods: FrictionMethod[] = ['hazen-williams', 'darcy-weisbach'];
const anyPipe = fc.constantFrom(...PIPE_CATALOGUE);
const anyMethod = fc.constantFrom(...methods);
/** Flows from a trickle (laminar) to a fast 4 m/s in the largest pipe. */
const anyFlow = fc.double({ min: 1e-7, max: 0.3, noNaN: true });
const anyLength = fc.double({ min: 0.1, max: 5000, noNaN: true });
const anyTemperature = fc.double({ min: 0, max: 40, noNaN: true });

describe('friction properties', () => {
  it('head loss rises with flow (monotone through laminar, transition and turbulent)', () => {
    fc.assert(
      fc.property(
        anyMethod,
        anyPipe,
        anyFlow,
        anyLength,
        anyTemperature,
        (method, pipe, flow, lengthM, temperatureC) => {
          const lower = pipeHeadLossM({ method, flowM3s: flow, lengthM, pipe, temperatureC });
          const higher = pipeHeadLossM({ method, flowM3s: flow * 1.01, lengthM, pipe, temperatureC });
          expect(Number.isFinite(lower)).toBe(true);
          expect(higher).toBeGreaterThan(lower);
        },
      ),
      { numRuns: 1000 },
    );
  });
  it('head loss is proportional to length', () => {
    fc.assert(
      fc.property(anyMethod, anyPipe, anyFlow, anyLength, (method, pipe, flow, lengthM) => {
        const one = pipeHeadLossM({ method, flowM3s: flow, lengthM, pipe });
        const two = pipeHeadLossM({ method, flowM3s: flow, lengthM: 2 * lengthM, pipe });
        expect(two).toBeCloseTo(2 * one, 10);
        expect(two).toBeGreaterThan(one);
      }),
    );
  });
  it('flowForHeadLoss inverts pipeHeadLossM (round trip)', () => {
    fc.assert(
      fc.property(
        anyMethod,
        anyPipe,
        anyFlow,
        anyLength,
        anyTemperature,
        (method, pipe, flow, lengthM, temperatureC) => {
          const loss = pipeHeadLossM({ method, flowM3s: flow, lengthM, pipe, temperatureC });
          const back = flowForHeadLoss({ method, headLossM: loss, lengthM, pipe, temperatureC });
          expect(Math.abs(back - flow) / flow).toBeLessThan(1e-9);
        },
      ),
      { numRuns: 1000 },
    );
  });
  it('odd in flow: reversing the flow reverses the loss', () => {
    fc.assert(
      fc.property(anyMethod, anyPipe, anyFlow, (method, pipe, flow) => {
        expect(pipeHeadLossM({ method, flowM3s: -flow, lengthM: 100, pipe })).toBe(
          -pipeHeadLossM({ method, flowM3s: flow, lengthM: 100, pipe }),
        );
      }),
    );
  });
});
