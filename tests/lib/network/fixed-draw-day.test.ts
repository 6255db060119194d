import { describe, expect, it } from 'vitest';
import type { NetworkContext } from '../../../lib/network/context';
import { dayNetworkRun } from '../../../lib/network/run-network';
import { DemandUseSchema } from '../../../lib/validations/demand-uses';
import { NetworkLinkSchema, NetworkNodeSchema } from '../../../lib/validations/network';
import { outletNodeBody, pipeLinkBody, sourceNodeBody } from '../../support/network-fixtures';

const SOURCE_ID = '00000000-0000-4000-8000-0000000000e1';
const OUTLET_ID = '00000000-0000-4000-8000-0000000000e2';
const USE_ID = '00000000-0000-4000-8000-0000000000e3';

/** Morning and evening: half the day's water in 07:00-08:00 and half in 18:00-19:00 (invented). */
const TWO_HOURS = Array.from({ length: 24 }, (_, hour) => (hour === 7 || hour === 18 ? 0.5 : 0));

/** Intake -> 250 m pipe -> tap with a fixed draw of 0.2 L/s (its peak), with or without a use tied to it. */
function context(tied: boolean): NetworkContext {
  const use = DemandUseSchema.parse({
    kind: 'people',
    count: 4,
    figureId: 'us-rural-home',
    deliveryKind: 'pattern',
    hourlyFractions: TWO_HOURS,
  });
  return {
    records: {
      projectId: 'p',
      nodes: [
        { id: SOURCE_ID, ...NetworkNodeSchema.parse(sourceNodeBody()) },
        { id: OUTLET_ID, ...NetworkNodeSchema.parse(outletNodeBody()) },
      ],
      links: [
        { id: '00000000-0000-4000-8000-0000000000e4', ...NetworkLinkSchema.parse(pipeLinkBody(SOURCE_ID, OUTLET_ID)) },
      ],
      demandUseTies: tied ? [{ demandUseId: USE_ID, outletNodeId: OUTLET_ID }] : [],
    },
    lines: [],
    tanks: [],
    ramOutlets: [],
    sourceYieldsM3s: {},
    demandUses: [{ id: USE_ID, position: 0, ...use }],
    prices: [],
  };
}

describe('a fixed-draw outlet in the 24-hour day', () => {
  it('draws its fixed flow in the busy hours of the uses tied to it, and nothing in the idle hours', () => {
    const day = dayNetworkRun(context(true));
    const draw = day.sources.find((s) => s.nodeId === SOURCE_ID)!.drawM3s;
    // Both busy hours carry half the day each, so each is the busiest hour: the fixed 0.2 L/s.
    expect(draw[7]).toBeCloseTo(0.0002, 12);
    expect(draw[18]).toBeCloseTo(0.0002, 12);
    expect(draw[3]).toBeCloseTo(0, 12);
    // The day's water: 2 h at 0.2 L/s = 1.44 m³ (it drew 17.28 m³ when it ran at its peak all day).
    expect(draw.reduce((sum, q) => sum + q * 3600, 0)).toBeCloseTo(1.44, 9);
  });

  it('with no use tied it has no hours to follow: it draws all day, and the day says so', () => {
    const day = dayNetworkRun(context(false));
    const draw = day.sources.find((s) => s.nodeId === SOURCE_ID)!.drawM3s;
    expect(draw.every((q) => Math.abs(q - 0.0002) < 1e-12)).toBe(true);
    expect(day.warnings.find((w) => w.nodeId === OUTLET_ID)?.message).toMatch(/draws that flow all day/);
  });
});
