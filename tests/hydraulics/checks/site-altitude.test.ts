import { describe, expect, it } from 'vitest';
import { analyzeLine, heightDatumOf, type LineInput } from '../../../hydraulics/index';
import { warningText } from '../../../lib/lines/warning-words';
import { lineInputOf } from '../../../lib/lines/line-input';
import { displayUnits } from '../../../lib/units';
import type { LineDesign } from '../../../lib/validations/line-design';

/**
 * A level-book line hung on an assumed 100 m start height, over a rise that pulls suction (invented).
 * The site is really at 2,500 m; nothing in the book says so (profile-and-checks.md §6.1).
 */
function levelBookLine(settings: LineInput['settings'] = {}): LineInput {
  return {
    stations: [
      { chainageM: 0, groundElevationM: 100 },
      { chainageM: 200, groundElevationM: 112 },
      { chainageM: 600, groundElevationM: 60 },
    ],
    stretches: [{ fromM: 0, toM: 600, pipe: 'pe100-iso4427-sdr11-50mm' }],
    start: { kind: 'water-level', levelM: 110 },
    end: { kind: 'free-discharge' },
    flow: { kind: 'design', flowM3s: 0.001 },
    settings: { defaultCoverM: 0, ...settings },
  };
}

describe('site altitude on an assumed datum (profile-and-checks.md §6.1)', () => {
  it('heights from a level, hose level, clinometer or typed in are on an assumed datum; GPS, GNSS, altimeter and map heights are not', () => {
    expect(heightDatumOf(['level', 'level'])).toBe('assumed');
    expect(heightDatumOf(['hose-level'])).toBe('assumed');
    expect(heightDatumOf(['inclinometer'])).toBe('assumed');
    expect(heightDatumOf(['typed'])).toBe('assumed');
    expect(heightDatumOf(['gps', 'gnss', 'map', 'altimeter'])).toBe('geodetic');
    expect(heightDatumOf(['gps', 'level'])).toBe('assumed');
    expect(heightDatumOf([undefined])).toBe('assumed');
  });

  it('a level-book line with suction and no stated altitude warns that the altitude is a guess, and says which figure it took', () => {
    const analysis = analyzeLine(levelBookLine({ heightDatum: 'assumed' }));
    expect(analysis.limits.siteAltitudeBasis).toBe('highest-ground');
    expect(analysis.limits.siteAltitudeM).toBe(112);
    const w = analysis.warnings.find((x) => x.code === 'site-altitude-assumed');
    expect(w?.severity).toBe('warning');
    expect(w?.values.siteAltitudeM).toBe(112);
    expect(w?.values.headM).toBeLessThan(0);
    // 112 m in the book against 2,500 m on site: vapour limits 9.98 m and 7.39 m at 20 °C ([C], §6.1).
    expect(analysis.limits.vapourLimitHeadM).toBeCloseTo(9.98, 1);
    expect(
      analyzeLine(levelBookLine({ heightDatum: 'assumed', siteAltitudeM: 2500 })).limits.vapourLimitHeadM,
    ).toBeCloseTo(7.39, 1);
  });

  it('no warning once the altitude is given, nor on a GPS route, and only advice where the line has no suction', () => {
    expect(
      analyzeLine(levelBookLine({ heightDatum: 'assumed', siteAltitudeM: 2500 })).warnings.map((w) => w.code),
    ).not.toContain('site-altitude-assumed');
    expect(analyzeLine(levelBookLine()).warnings.map((w) => w.code)).not.toContain('site-altitude-assumed');
    const noSuction = analyzeLine({
      ...levelBookLine({ heightDatum: 'assumed' }),
      start: { kind: 'water-level', levelM: 130 },
    });
    expect(noSuction.warnings.find((w) => w.code === 'site-altitude-assumed')?.severity).toBe('info');
  });

  it('the route decides the datum: a level-book route gives an assumed datum, a GPS walk does not', () => {
    const design = {
      stretches: levelBookLine().stretches,
      start: levelBookLine().start,
      end: levelBookLine().end,
      flow: levelBookLine().flow,
      settings: {},
    } as unknown as LineDesign;
    const stations = levelBookLine().stations;
    expect(
      lineInputOf(
        design,
        stations.map((s) => ({ ...s, heightSource: 'level' as const })),
      ).settings?.heightDatum,
    ).toBe('assumed');
    expect(
      lineInputOf(
        design,
        stations.map((s) => ({ ...s, heightSource: 'gps' as const })),
      ).settings?.heightDatum,
    ).toBeUndefined();
  });

  it('a US project reads the warning in feet', () => {
    const w = analyzeLine(levelBookLine({ heightDatum: 'assumed' })).warnings.find(
      (x) => x.code === 'site-altitude-assumed',
    )!;
    const text = warningText(w, displayUnits('us'));
    // 112 m = 367.45 ft (1 ft = 0.3048 m exactly, core.md §7; an elevation, to the hundredth).
    expect(text.message).toContain('367.45 ft');
    expect(text.message).not.toMatch(/\d m\b/);
    expect(text.fix).toMatch(/Site altitude/);
  });
});
