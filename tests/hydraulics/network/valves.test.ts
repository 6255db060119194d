import { describe, expect, it } from 'vitest';
import {
  HydraulicsInputError,
  solveNetwork,
  type NetworkInput,
  type NetworkLink,
  type NetworkNode,
} from '../../../hydraulics/index';

const PIPE = { id: 'p50', insideDiameterM: 0.05, hazenWilliamsC: 140 };
const HAND = {
  frictionMethod: 'hazen-williams' as const,
  freeSurfaceLosses: false,
  hazenWilliamsConstant: 10.67,
  hazenWilliamsFlowExponent: 1.852,
  hazenWilliamsDiameterExponent: 4.87,
};

function net(nodes: NetworkNode[], links: Omit<NetworkLink, 'pipe'>[]): NetworkInput {
  return { nodes, links: links.map((link) => ({ pipe: PIPE, ...link })), settings: HAND };
}

describe('solveNetwork: valves', () => {
  it('a check valve shuts against reverse flow and the other tank feeds the tap', () => {
    const input = net(
      [
        { id: 'low-tank', kind: 'tank', elevationM: 50, waterLevelM: 52 },
        { id: 'high-tank', kind: 'tank', elevationM: 80, waterLevelM: 82 },
        { id: 'tee', kind: 'junction', elevationM: 40 },
        { id: 'tap', kind: 'outlet', elevationM: 30, demandM3s: 0.0005 },
      ],
      [
        { id: 'from-low', from: 'low-tank', to: 'tee', lengthM: 200, status: 'check-valve' },
        { id: 'from-high', from: 'high-tank', to: 'tee', lengthM: 200 },
        { id: 'to-tap', from: 'tee', to: 'tap', lengthM: 100 },
      ],
    );
    const solution = solveNetwork(input);
    expect(solution.converged).toBe(true);
    expect(solution.valveStates['from-low']).toBe('closed');
    expect(Math.abs(solution.flowsM3s['from-low'])).toBeLessThan(1e-9);
    expect(solution.flowsM3s['from-high']).toBeCloseTo(0.0005, 9);
    // Without the check valve the high tank would push water back into the low one.
    const open = solveNetwork({ ...input, links: input.links.map((link) => ({ ...link, status: 'open' as const })) });
    expect(open.flowsM3s['from-low']).toBeLessThan(-1e-4);
  });

  it('a check valve facing the flow stays open', () => {
    const solution = solveNetwork(
      net(
        [
          { id: 'spring', kind: 'source', elevationM: 100 },
          { id: 'tap', kind: 'outlet', elevationM: 60, demandM3s: 0.001 },
        ],
        [{ id: 'line', from: 'spring', to: 'tap', lengthM: 300, status: 'check-valve' }],
      ),
    );
    expect(solution.valveStates.line).toBe('open');
    expect(solution.flowsM3s.line).toBeCloseTo(0.001, 12);
  });

  it('a closed valve carries nothing and cuts off what lies beyond it, by name', () => {
    const solution = solveNetwork(
      net(
        [
          { id: 'spring', kind: 'source', elevationM: 100 },
          { id: 'tee', kind: 'junction', elevationM: 70 },
          { id: 'garden', kind: 'outlet', elevationM: 60, demandM3s: 0.001 },
          { id: 'barn', kind: 'outlet', elevationM: 65, demandM3s: 0.0004 },
        ],
        [
          { id: 'main', from: 'spring', to: 'tee', lengthM: 300 },
          { id: 'garden-valve', from: 'tee', to: 'garden', lengthM: 50, status: 'closed' },
          { id: 'barn-line', from: 'tee', to: 'barn', lengthM: 80 },
        ],
      ),
    );
    expect(solution.converged).toBe(true);
    expect(solution.flowsM3s['garden-valve']).toBe(0);
    expect(solution.flowsM3s.main).toBeCloseTo(0.0004, 12);
    expect(solution.isolatedNodeIds).toEqual(['garden']);
    expect(solution.headsM.garden).toBeUndefined();
    const warning = solution.warnings.find((w) => w.code === 'isolated-nodes');
    expect(warning?.severity).toBe('danger');
    expect(warning?.message).toContain('"garden"');
  });

  it('a PRV holds its set pressure downstream and the flow follows continuity', () => {
    const solution = solveNetwork(
      net(
        [
          { id: 'tank', kind: 'tank', elevationM: 200, waterLevelM: 202 },
          { id: 'above', kind: 'junction', elevationM: 100 },
          { id: 'below', kind: 'junction', elevationM: 100 },
          { id: 'house', kind: 'outlet', elevationM: 95, demandM3s: 0.001 },
        ],
        [
          { id: 'main', from: 'tank', to: 'above', lengthM: 800 },
          { id: 'prv', from: 'above', to: 'below', lengthM: 0, status: 'prv', setPressureHeadM: 30 },
          { id: 'service', from: 'below', to: 'house', lengthM: 60 },
        ],
      ),
    );
    expect(solution.converged).toBe(true);
    expect(solution.valveStates.prv).toBe('active');
    expect(solution.pressureHeadsM.below).toBeCloseTo(30, 6);
    expect(solution.flowsM3s.prv).toBeCloseTo(0.001, 10);
    // Downstream of the PRV the grade falls by the service pipe's friction only.
    expect(solution.headsM.house).toBeCloseTo(130 - solution.headLossesM.service, 6);
    expect(solution.maxContinuityErrorM3s).toBeLessThan(1e-9);
  });

  it('a PRV whose upstream head is below its setting stands open and says so', () => {
    const solution = solveNetwork(
      net(
        [
          { id: 'tank', kind: 'tank', elevationM: 120, waterLevelM: 121 },
          { id: 'above', kind: 'junction', elevationM: 100 },
          { id: 'below', kind: 'outlet', elevationM: 100, demandM3s: 0.0005 },
        ],
        [
          { id: 'main', from: 'tank', to: 'above', lengthM: 200 },
          { id: 'prv', from: 'above', to: 'below', lengthM: 1, status: 'prv', setPressureHeadM: 40 },
        ],
      ),
    );
    expect(solution.valveStates.prv).toBe('open');
    expect(solution.pressureHeadsM.below).toBeLessThan(21);
    expect(solution.warnings.map((w) => w.code)).toContain('prv-not-reducing');
  });

  it('a break-pressure tank passes only what its outlets draw and resets the grade to its level', () => {
    const solution = solveNetwork(
      net(
        [
          { id: 'spring', kind: 'source', elevationM: 300 },
          { id: 'bpt', kind: 'break-pressure-tank', elevationM: 199, waterLevelM: 200 },
          { id: 'tap', kind: 'outlet', elevationM: 150, demandM3s: 0.0008 },
        ],
        [
          { id: 'upper', from: 'spring', to: 'bpt', lengthM: 600 },
          { id: 'lower', from: 'bpt', to: 'tap', lengthM: 400 },
        ],
      ),
    );
    expect(solution.converged).toBe(true);
    expect(solution.flowsM3s.upper).toBeCloseTo(0.0008, 10);
    expect(solution.headsM.bpt).toBeCloseTo(200, 6);
    expect(solution.headsM.tap).toBeCloseTo(200 - solution.headLossesM.lower, 6);
  });

  it('flags a break-pressure tank the pipe above cannot keep up with', () => {
    const solution = solveNetwork(
      net(
        [
          { id: 'spring', kind: 'source', elevationM: 201 },
          { id: 'bpt', kind: 'break-pressure-tank', elevationM: 199, waterLevelM: 200 },
          { id: 'tap', kind: 'outlet', elevationM: 100, demandM3s: 0.004 },
        ],
        [
          { id: 'upper', from: 'spring', to: 'bpt', lengthM: 2000 },
          { id: 'lower', from: 'bpt', to: 'tap', lengthM: 400 },
        ],
      ),
    );
    expect(solution.warnings.map((w) => w.code)).toContain('break-pressure-tank-starved');
    expect(solution.headsM.bpt).toBeLessThan(200);
  });

  it('a float valve on a full tank shuts; below full it lets the tank fill', () => {
    const nodes = (levelM: number): NetworkNode[] => [
      { id: 'spring', kind: 'source', elevationM: 100 },
      { id: 'tank', kind: 'tank', elevationM: 60, waterLevelM: levelM, tank: { overflowLevelM: 62, areaM2: 4 } },
    ];
    const links = [{ id: 'fill', from: 'spring', to: 'tank', lengthM: 300, status: 'float-valve' as const }];
    expect(solveNetwork(net(nodes(62), links)).flowsM3s.fill).toBe(0);
    expect(solveNetwork(net(nodes(61), links)).flowsM3s.fill).toBeGreaterThan(0.001);
  });
});

describe('solveNetwork: bad networks are named', () => {
  it('names the nodes of a part with no source or tank', () => {
    const input = net(
      [
        { id: 'spring', kind: 'source', elevationM: 100 },
        { id: 'tap', kind: 'outlet', elevationM: 60, demandM3s: 0.001 },
        { id: 'stray-tee', kind: 'junction', elevationM: 50 },
        { id: 'stray-trough', kind: 'outlet', elevationM: 40, demandM3s: 0.001 },
      ],
      [
        { id: 'a', from: 'spring', to: 'tap', lengthM: 100 },
        { id: 'b', from: 'stray-tee', to: 'stray-trough', lengthM: 100 },
      ],
    );
    expect(() => solveNetwork(input)).toThrow(HydraulicsInputError);
    expect(() => solveNetwork(input)).toThrow(/"stray-tee", "stray-trough" are not connected to any source or tank/);
  });

  it('names a link that points at a missing node, and a duplicate id', () => {
    const base = net(
      [
        { id: 'spring', kind: 'source', elevationM: 100 },
        { id: 'tap', kind: 'outlet', elevationM: 60 },
      ],
      [{ id: 'a', from: 'spring', to: 'tap', lengthM: 100 }],
    );
    expect(() => solveNetwork({ ...base, links: [{ ...base.links[0], to: 'nowhere' }] })).toThrow(
      /links.to\[0\]: link "a" names no node "nowhere"/,
    );
    expect(() => solveNetwork({ ...base, nodes: [...base.nodes, base.nodes[1]] })).toThrow(
      /nodes.id\[2\]: "tap" is used twice/,
    );
    expect(() => solveNetwork({ ...base, links: [{ ...base.links[0], pipe: 'no-such-pipe' }] })).toThrow(
      /no catalogue pipe "no-such-pipe"/,
    );
    expect(() => solveNetwork({ ...base, links: [{ ...base.links[0], lengthM: -3 }] })).toThrow(/links.lengthM\[0\]/);
  });

  it('reports a run that cannot converge in the iterations allowed', () => {
    const input = net(
      [
        { id: 'spring', kind: 'source', elevationM: 100 },
        { id: 'a', kind: 'junction', elevationM: 50 },
        { id: 'b', kind: 'outlet', elevationM: 40, demandM3s: 0.002 },
      ],
      [
        { id: 'x', from: 'spring', to: 'a', lengthM: 100 },
        { id: 'y', from: 'a', to: 'b', lengthM: 100 },
        { id: 'z', from: 'spring', to: 'b', lengthM: 300 },
      ],
    );
    const solution = solveNetwork({ ...input, settings: { ...input.settings, maxIterations: 1 } });
    expect(solution.converged).toBe(false);
    expect(solution.warnings[0].code).toBe('not-converged');
    expect(solution.warnings[0].message).toMatch(/stopped after 1 iterations/);
  });
});
