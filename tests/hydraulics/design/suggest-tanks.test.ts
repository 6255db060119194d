import { describe, expect, it } from 'vitest';
import { analyzeLine, applyLineFixes, type LineInput, type LineStation } from '../../../hydraulics/index';

/**
 * An invented 1.4 km spring line falling 412 -> 316 m with a 60 m deep valley between ch. 500 and
 * 900 m, in 63 mm PE100 SDR 17 (PN 10, about 102 m of head): the valley floor is over the rating
 * with the line shut, and the valley's far rim is a summit the water must climb back over.
 */
function valleyLine(): LineInput {
  const stations: LineStation[] = [];
  for (let i = 0; i <= 140; i++) {
    const x = i * 10;
    const valley = x > 500 && x < 900 ? 60 * Math.sin((Math.PI * (x - 500)) / 400) : 0;
    stations.push({ chainageM: x, groundElevationM: 412 - (96 * x) / 1400 - valley });
  }
  return {
    stations,
    stretches: [{ fromM: 0, toM: 1400, pipe: 'pe100-iso4427-sdr17-63mm' }],
    start: { kind: 'water-level', levelM: 413 },
    end: { kind: 'outlet', elevationM: 316, residualHeadM: 10 },
    flow: { kind: 'design', flowM3s: 0.001 },
  };
}

describe('suggested break-pressure tanks', () => {
  it('clear the over-pressure without pulling a siphon at the summit after them', () => {
    const line = valleyLine();
    const before = analyzeLine(line);
    const over = before.warnings.find((w) => w.code === 'static-over-rating');
    expect(over).toBeDefined();
    expect(over!.fixes).toHaveLength(1);

    const after = analyzeLine(applyLineFixes(line, over!.fixes));
    const codes = after.warnings.map((w) => w.code);
    expect(codes).not.toContain('static-over-rating');
    // "Residual pressure head ... never negative" (Jordan p.52 via ITACA [R1]): the tank is placed
    // high enough for the design flow to pass the summit with the minimum residual head (3 m default).
    expect(codes).not.toContain('negative-pressure');
    const { pressureHeadM, chainageM } = after.points;
    const tankAt = (over!.fixes[0] as { chainageM: number }).chainageM;
    let lowest = Infinity;
    for (let i = 0; i < chainageM.length; i++) if (chainageM[i] > tankAt) lowest = Math.min(lowest, pressureHeadM[i]);
    expect(lowest).toBeGreaterThanOrEqual(3 - 1e-6);
  });

  it('leave the static line within the rating everywhere', () => {
    const line = valleyLine();
    const fixes = analyzeLine(line).warnings.find((w) => w.code === 'static-over-rating')!.fixes;
    const after = analyzeLine(applyLineFixes(line, fixes));
    const allowable = after.stretches[0].allowableHeadM;
    for (const head of after.points.staticPressureHeadM) expect(head).toBeLessThanOrEqual(allowable + 1e-6);
  });
});
