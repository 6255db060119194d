import { describe, expect, it } from 'vitest';
import { analyzeLine, applyLineFixes, findPipe } from '../../../hydraulics/index';
import { lineAnswers } from '../../../lib/lines/answers';
import {
  addDevice,
  DesignEditError,
  mergeWithNext,
  moveJoint,
  removeDevice,
  setStretchPipe,
  splitStretch,
} from '../../../lib/lines/edit-design';
import { record, redo, startHistory, undo } from '../../../lib/lines/history';
import { designWithInput, lineInputOf } from '../../../lib/lines/line-input';
import {
  closestInSeries,
  familyIdOf,
  PIPE_FAMILIES,
  pipeChoiceOf,
  pipeForFamily,
} from '../../../lib/lines/pipe-choices';
import { lineStationsOf } from '../../../lib/lines/route-stations';
import { LineDesignSchema, type LineDesign } from '../../../lib/validations/line-design';
import { referenceDesignParts, referenceLine } from '../../lines/reference-line';

function referenceDesign(): LineDesign {
  return LineDesignSchema.parse(referenceDesignParts());
}

describe('editing the stretches', () => {
  it('splits a stretch in two at a chainage, both halves keeping the pipe, and joins them back', () => {
    const d = referenceDesign();
    const split = splitStretch(d, 800);
    expect(split.stretches).toEqual([
      { fromM: 0, toM: 300, pipe: 'pe80-iso4427-sdr17-40mm' },
      { fromM: 300, toM: 800, pipe: 'pe80-iso4427-sdr17-50mm' },
      { fromM: 800, toM: 1400, pipe: 'pe80-iso4427-sdr17-50mm' },
    ]);
    expect(d.stretches).toHaveLength(2); // input untouched
    expect(mergeWithNext(split, 1).stretches).toEqual(d.stretches);
  });

  it('refuses a split at a joint or off the line, and a join of the last stretch', () => {
    const d = referenceDesign();
    expect(() => splitStretch(d, 300)).toThrow(DesignEditError);
    expect(() => splitStretch(d, 1500)).toThrow(/No stretch runs through 1500 m/);
    expect(() => mergeWithNext(d, 1)).toThrow(/another after it/);
  });

  it('moves a joint only between the neighbouring ends, and sets a pipe', () => {
    const d = referenceDesign();
    expect(moveJoint(d, 0, 450).stretches.map((s) => [s.fromM, s.toM])).toEqual([
      [0, 450],
      [450, 1400],
    ]);
    expect(() => moveJoint(d, 0, 1400)).toThrow(/between 0 m and 1400 m/);
    expect(setStretchPipe(d, 1, 'pe100-iso4427-sdr11-63mm').stretches[1].pipe).toBe('pe100-iso4427-sdr11-63mm');
  });

  it('keeps devices in chainage order', () => {
    const d = addDevice(addDevice(referenceDesign(), { kind: 'washout', chainageM: 650 }), {
      kind: 'washout',
      chainageM: 100,
    });
    expect(d.devices.map((x) => x.chainageM)).toEqual([100, 650, 900]);
    expect(removeDevice(d, 0).devices.map((x) => x.chainageM)).toEqual([650, 900]);
  });
});

describe('a one-click fix on the design, and undo', () => {
  it('applies the suggested break-pressure tank through the core and undoes it', () => {
    const d = referenceDesign();
    const stations = referenceLine().stations;
    const before = analyzeLine(lineInputOf(d, stations));
    const w = before.warnings.find((x) => x.code === 'static-over-rating')!;
    const fixed = designWithInput(d, applyLineFixes(lineInputOf(d, stations), w.fixes));
    expect(fixed.devices.map((x) => x.kind)).toEqual(['break-pressure-tank', 'air-release-valve']);
    expect(analyzeLine(lineInputOf(fixed, stations)).warnings.map((x) => x.code)).not.toContain('static-over-rating');

    let h = record(startHistory(d), fixed, 'add a break-pressure tank');
    expect(h.label).toBe('add a break-pressure tank');
    h = undo(h);
    expect(h.present).toBe(d);
    h = redo(h);
    expect(h.present).toBe(fixed);
    expect(undo(startHistory(d)).present).toBe(d);
  });
});

describe('headline answers', () => {
  it('finds the worst static pressure at the sag and counts warnings by severity', () => {
    const a = analyzeLine(referenceLine());
    const answers = lineAnswers(a);
    // Static head 412 m over the pipe at the sag: ground 300 m less 0.75 m cover = 112.75 m.
    expect(answers.worstStatic.chainageM).toBe(650);
    expect(answers.worstStatic.headM).toBeCloseTo(412 - (300 - 0.75), 9);
    expect(answers.counts.danger + answers.counts.warning + answers.counts.info).toBe(a.warnings.length);
    expect(answers.endResidualHeadM).toBe(a.end.residualHeadM);
  });
});

describe('pipe pickers from the catalogue', () => {
  it('groups every series by material and standard and keeps the bore when the class changes', () => {
    expect(PIPE_FAMILIES.map((f) => f.id)).toEqual([
      'pvc-d2241',
      'pe-d2239',
      'pe100-iso4427',
      'pe80-iso4427',
      'steel-sch40',
    ]);
    expect(familyIdOf('pe100-iso4427-sdr13.6')).toBe('pe100-iso4427');
    expect(pipeChoiceOf('pe80-iso4427-sdr17-50mm')).toEqual({
      familyId: 'pe80-iso4427',
      seriesId: 'pe80-iso4427-sdr17',
    });
    expect(pipeChoiceOf('old-barn-pipe')).toBeNull();
    // 50 mm PE80 SDR 17 has a 44.0 mm bore; the nearest PE100 SDR 11 bore is the 50 mm one (40.8 mm, not 51.4 mm).
    expect(closestInSeries('pe100-iso4427-sdr11', findPipe('pe80-iso4427-sdr17-50mm'))).toBe(
      'pe100-iso4427-sdr11-50mm',
    );
    // With no pipe yet the picker aims at a 50 mm bore: the 63 mm pipe's 51.4 mm.
    expect(closestInSeries('pe100-iso4427-sdr11', undefined)).toBe('pe100-iso4427-sdr11-63mm');
  });

  it("a change of material keeps the nearest bore (and a class rated at least as high), never the family's smallest pipe", () => {
    const from = findPipe('pe100-iso4427-sdr11-50mm')!;
    for (const family of PIPE_FAMILIES) {
      const picked = findPipe(pipeForFamily(family.id, from))!;
      const bores = family.classes.flatMap((c) => c.pipes).map((p) => findPipe(p.id)!.insideDiameterM);
      const nearest = Math.min(...bores.map((b) => Math.abs(b - from.insideDiameterM)));
      // Within 10 % of the bore of the nearest size the family makes.
      expect(Math.abs(picked.insideDiameterM - from.insideDiameterM), family.id).toBeLessThanOrEqual(
        nearest + 0.1 * from.insideDiameterM,
      );
      expect(picked.insideDiameterM, family.id).toBeGreaterThan(0.03);
    }
    // PVC (ASTM D2241): SDR 13.5 is made in 1/2 in only; the 40.8 mm bore of 50 mm PE100 SDR 11 (16 bar) becomes
    // 1-1/2 in SDR 17 (about 42.6 mm bore, 250 psi = 17.2 bar, the lowest PVC class rated at least 16 bar).
    const pvc = findPipe(pipeForFamily('pvc-d2241', from))!;
    expect(pvc.nominalSize).toBe('1-1/2 in');
    expect(pvc.sdr).toBe(17);
    // Steel Schedule 40 has one class: 1-1/2 in (40.9 mm bore) is the nearest.
    expect(findPipe(pipeForFamily('steel-sch40', from))!.nominalSize).toBe('1-1/2 in');
    // PE80 to PE100 at 10 bar: 63 mm SDR 17 keeps its size and takes PE100 SDR 17 (10 bar).
    const pe100 = findPipe(pipeForFamily('pe100-iso4427', findPipe('pe80-iso4427-sdr13.6-63mm')))!;
    expect([pe100.nominalSize, pe100.pressureRatingPa]).toEqual(['63 mm', 1e6]);
    // Back the other way the 16 bar pipe keeps its 16 bar in PE80 (SDR 9).
    expect(pipeForFamily('pe80-iso4427', from)).toMatch(/^pe80-iso4427-sdr9-50mm$/);
  });
});

describe('stations of a line from its route', () => {
  const columns = {
    chainageM: [0, 100, 100, 200, 300],
    elevationM: [50, 45, 45, 40, 30],
    latitude: [54.5, 54.501, 54.501, 54.502, null],
    longitude: [-2.6, -2.6, -2.6, -2.6, null],
  };

  it('drops a repeated chainage and keeps map positions where surveyed', () => {
    const s = lineStationsOf(columns, { fromChainageM: null, toChainageM: null });
    expect(s.map((x) => x.chainageM)).toEqual([0, 100, 200, 300]);
    expect(s[3].latitudeDeg).toBeUndefined();
    expect(s[1]).toMatchObject({ groundElevationM: 45, latitudeDeg: 54.501 });
  });

  it('cuts a window with interpolated ends on the route chainage', () => {
    const s = lineStationsOf(columns, { fromChainageM: 50, toChainageM: 250 });
    expect(s.map((x) => [x.chainageM, x.groundElevationM])).toEqual([
      [50, 47.5],
      [100, 45],
      [200, 40],
      [250, 35],
    ]);
  });
});
