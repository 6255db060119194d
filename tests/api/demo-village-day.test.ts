import { describe, expect, it } from 'vitest';
import { loadNetworkContext } from '../../lib/data/network-context';
import { dayNetworkRun, solveNetworkRun } from '../../lib/network/run-network';

// The demo seed is in the test database: the Orrin Ford village supply (seeders/...-demo-village-network
// and ...-demo-village-day). Its day runs through the same loader and run as the network page's
// "Run a 24-hour day" (the worker task calls dayNetworkRun on the loaded context).
const ORRIN_FORD = '6f1c1e52-3a57-4c38-9b0e-0d5b1c7a2003';

describe('the Orrin Ford demo village over a day', () => {
  it('keeps water in its storage tank all day, spills nothing and draws no more than the spring gives', async () => {
    const context = await loadNetworkContext(ORRIN_FORD);
    const day = dayNetworkRun(context);
    const codes = day.warnings.map((w) => w.code);
    expect(codes, JSON.stringify(day.warnings)).not.toContain('tank-empties');
    expect(codes).not.toContain('tank-overflows');
    expect(codes).not.toContain('source-over-yield');
    // Every outlet draws the uses tied to it: no "draws that flow all day" assumption.
    expect(codes).not.toContain('network.assumed-figure');
    expect(day.tanks).toHaveLength(1);
    const [tank] = day.tanks;
    expect(tank.levelsM).toHaveLength(25);
    for (const level of tank.levelsM) expect(level).toBeGreaterThan(tank.floorM);
    // The storage the tank's served outlets need (their day plus the record's reserve) fits in the tank.
    const record = context.tanks.find((t) => t.name === 'Orrin Ford storage tank')!;
    expect(tank.storageNeededM3).toBeGreaterThan(0);
    expect(tank.storageNeededM3!).toBeLessThan(record.volumeM3!);
    // The spring has a design yield from its bucket tests, and its line draws less than that.
    const [spring] = day.sources;
    expect(spring.yieldM3s).toBeGreaterThan(0);
    expect(Math.max(...spring.drawM3s)).toBeLessThan(spring.yieldM3s!);
  });

  it('gives every tap stand and the school its residual head at the peak hour', async () => {
    const context = await loadNetworkContext(ORRIN_FORD);
    const solve = solveNetworkRun(context);
    expect(solve.converged).toBe(true);
    for (const node of solve.nodes) {
      if (node.minPressureHeadM !== null) expect(node.pressureHeadM!).toBeGreaterThanOrEqual(node.minPressureHeadM);
    }
    expect(dayNetworkRun(context).warnings.map((w) => w.code)).not.toContain('outlet-short-at-peak');
  });
});
