import { describe, expect, it } from 'vitest';
import { PE_ISO4427_ROWS, PE_ISO4427_SDRS } from '@/hydraulics/catalogue/data/pe-iso4427';
import { PVC_D2241_ROWS } from '@/hydraulics/catalogue/data/pvc-d2241';

// The stored pipe tables checked against the standards' own wall rules (docs/references/core.md [R32],
// rules from memory): ISO 4065 for the PE walls of ISO 4427-2 / EN 12201-2, ASTM D2241 for PVC.

/** Exact Renard-series pipe series S behind each nominal SDR (ISO 4065 [R32]). */
const SERIES_S: Record<number, number> = {
  17: 10 ** 0.9,
  13.6: 10 ** 0.8,
  11: 10 ** 0.7,
  9: 10 ** 0.6,
  7.4: 10 ** 0.5,
};
/** Small sizes the PE standards print thicker than the series rule gives [R32]. */
const THICKER_THAN_SERIES = new Set(['20/7.4', '25/9']);

describe('PE walls (ISO 4427-2 / EN 12201-2) against the ISO 4065 series rule [R32]', () => {
  const cells = PE_ISO4427_ROWS.flatMap((row) =>
    row.wallMm.flatMap((wall, index) =>
      wall === null ? [] : [{ od: row.outsideDiameterMm, sdr: PE_ISO4427_SDRS[index], wall }],
    ),
  );

  it('covers every stored wall', () => {
    expect(cells.length).toBeGreaterThan(45);
  });

  it.each(cells)(
    '$od mm SDR $sdr: $wall mm is d/(2S+1) to the nearest 0.1 mm step, never thinner, 2.0 mm at least',
    ({ od, sdr, wall }) => {
      const exact = od / (2 * SERIES_S[sdr] + 1);
      expect(wall).toBeGreaterThanOrEqual(2.0);
      if (wall === 2.0 && exact < 2.0) return;
      if (THICKER_THAN_SERIES.has(`${od}/${sdr}`)) {
        expect(wall).toBeGreaterThan(exact);
        expect(wall - exact).toBeLessThan(0.3);
        return;
      }
      // Within one 0.1 mm step of the exact series value; never more than rounding below it.
      expect(Math.abs(wall - exact)).toBeLessThan(0.1);
      expect(wall).toBeGreaterThan(exact - 0.005);
    },
  );
});

describe('PVC average walls (ASTM D2241) against minimum wall + half the tolerance [R32]', () => {
  const cells = PVC_D2241_ROWS.flatMap((row) =>
    Object.entries(row.averageWallIn).map(([sdr, average]) => ({
      size: row.size,
      od: row.outsideDiameterIn,
      sdr: Number(sdr),
      average: average as number,
    })),
  );

  it('covers every stored average wall', () => {
    expect(cells.length).toBeGreaterThan(50);
  });

  it.each(cells)('$size in SDR $sdr: $average in', ({ od, sdr, average }) => {
    const minimum = Math.max(Math.round((od / sdr) * 1000) / 1000, 0.06);
    const tolerance = Math.max(0.12 * minimum, 0.02);
    expect(average).toBeCloseTo(minimum + tolerance / 2, 2);
    expect(Math.abs(average - (minimum + tolerance / 2))).toBeLessThan(0.002);
  });
});
