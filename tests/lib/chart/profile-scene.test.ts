import { describe, expect, it } from 'vitest';
import { analyzeLine, applyLineFixes, type LineAnalysis } from '../../../hydraulics/index';
import { profileScene } from '../../../lib/chart/profile-scene';
import { svgToString } from '../../../lib/chart/svg-node';
import { displayUnits } from '../../../lib/units/index';
import { referenceLine } from '../../lines/reference-line';
import { findAll, layer, parseSvg, pathPoints, type XmlElement } from './svg-tree';

const metric = displayUnits('metric');

/** The chart's own mapping, rebuilt from the numbers it writes on the drawing. */
function scales(svg: XmlElement, panel: 'elevation' | 'pressure') {
  const g = findAll(svg, (e) => e.attrs['data-panel'] === panel)[0];
  const [left, right] = g.attrs['data-x-range'].split(' ').map(Number);
  const [bottom, top] = g.attrs['data-y-range'].split(' ').map(Number);
  const [lo, hi] = g.attrs['data-y-domain-m'].split(' ').map(Number);
  const from = Number(svg.attrs['data-from-m']);
  const to = Number(svg.attrs['data-to-m']);
  return {
    chainageOf: (x: number) => from + ((x - left) / (right - left)) * (to - from),
    x: (c: number) => left + ((c - from) / (to - from)) * (right - left),
    y: (v: number) => bottom + ((v - lo) / (hi - lo)) * (top - bottom),
  };
}

function drawn(analysis: LineAnalysis, options: Partial<Parameters<typeof profileScene>[1]> = {}) {
  const scene = profileScene(analysis, { units: metric, devices: [], width: 1000, ...options });
  return { scene, svg: parseSvg(svgToString(scene.root)) };
}

/** Each vertex lands on an analysed point: its chainage within rounding, its height equal to `value(i)`. */
function expectOnPoints(d: string, analysis: LineAnalysis, s: ReturnType<typeof scales>, value: (i: number) => number) {
  const c = analysis.points.chainageM;
  const pts = pathPoints(d);
  expect(pts.length).toBeGreaterThan(1);
  for (const [x, y] of pts) {
    const chainage = s.chainageOf(x);
    let i = 0;
    for (let k = 1; k < c.length; k++) if (Math.abs(c[k] - chainage) < Math.abs(c[i] - chainage)) i = k;
    expect(Math.abs(c[i] - chainage)).toBeLessThan(0.02); // 0.005 px of rounding is under 0.01 m here
    expect(y).toBeCloseTo(s.y(value(i)), 1);
  }
  return pts;
}

describe('long profile drawing of the reference line', () => {
  const input = referenceLine();
  const analysis = analyzeLine(input);
  const { svg, scene } = drawn(analysis, { devices: input.devices });

  it('has every layer', () => {
    for (const name of [
      'background',
      'zones',
      'axes',
      'ground',
      'pipe',
      'static',
      'grade',
      'pressure',
      'devices',
      'legend',
    ])
      expect(() => layer(svg, name)).not.toThrow();
  });

  it('draws the ground, the hydraulic grade and the flowing pressure through the analysed points', () => {
    const e = scales(svg, 'elevation');
    const p = scales(svg, 'pressure');
    const ground = findAll(layer(svg, 'ground'), (n) => n.attrs['data-role'] === 'ground-line')[0];
    const pts = expectOnPoints(ground.attrs.d, analysis, e, (i) => analysis.points.groundElevationM[i]);
    expect(pts).toHaveLength(analysis.points.chainageM.length); // short line: nothing thinned
    const grade = findAll(layer(svg, 'grade'), (n) => n.tag === 'path');
    expect(grade).toHaveLength(1);
    expectOnPoints(grade[0].attrs.d, analysis, e, (i) => analysis.points.hydraulicGradeM[i]);
    const flowing = findAll(layer(svg, 'pressure'), (n) => n.attrs['data-role'] === 'flowing-pressure')[0].children[0];
    expectOnPoints(flowing.attrs.d, analysis, p, (i) => analysis.points.pressureHeadM[i]);
  });

  it('draws one pipe path per stretch on the pipe elevations, coloured by pressure class', () => {
    const e = scales(svg, 'elevation');
    const pipes = findAll(layer(svg, 'pipe'), (n) => n.tag === 'path');
    expect(pipes.map((n) => n.attrs['data-pipe'])).toEqual(['pe80-iso4427-sdr17-40mm', 'pe80-iso4427-sdr17-50mm']);
    expect(pipes[0].attrs.stroke).toBe(pipes[1].attrs.stroke); // both PN 8
    expect(Number(pipes[1].attrs['stroke-width'])).toBeGreaterThan(Number(pipes[0].attrs['stroke-width'])); // wider bore, wider line
    for (const pipe of pipes) expectOnPoints(pipe.attrs.d, analysis, e, (i) => analysis.points.pipeElevationM[i]);
    const first = pathPoints(pipes[0].attrs.d);
    expect(e.chainageOf(first[first.length - 1][0])).toBeCloseTo(300, 1);
  });

  it('draws the static line flat at the source level and the allowed head per stretch', () => {
    const e = scales(svg, 'elevation');
    const p = scales(svg, 'pressure');
    const statics = findAll(layer(svg, 'static'), (n) => n.attrs['data-role'] === 'static');
    expect(statics).toHaveLength(1);
    for (const [, y] of pathPoints(statics[0].attrs.d)) expect(y).toBeCloseTo(e.y(412), 1);
    const allowed = findAll(layer(svg, 'pressure'), (n) => n.attrs['data-allowable-m'] !== undefined);
    expect(allowed).toHaveLength(2);
    allowed.forEach((n, k) => {
      for (const [, y] of pathPoints(n.attrs.d)) expect(y).toBeCloseTo(p.y(analysis.stretches[k].allowableHeadM), 1);
    });
  });

  it('shades each range warning across both panels at its chainages and flags single places', () => {
    const e = scales(svg, 'elevation');
    const zones = findAll(layer(svg, 'zones'), (n) => n.attrs['data-code'] !== undefined);
    expect(zones).toHaveLength(analysis.warnings.length);
    const over = zones.find((z) => z.attrs['data-code'] === 'static-over-rating')!;
    const w = analysis.warnings.find((x) => x.code === 'static-over-rating')!;
    const range = w.at as { fromM: number; toM: number };
    const rects = over.children.filter((n) => n.tag === 'rect');
    expect(rects).toHaveLength(3);
    expect(Number(rects[0].attrs.x)).toBeCloseTo(e.x(range.fromM), 1);
    expect(Number(rects[0].attrs.x) + Number(rects[0].attrs.width)).toBeCloseTo(e.x(range.toM), 1);
    expect(over.attrs['data-severity']).toBe('danger');
    const sag = zones.find((z) => z.attrs['data-code'] === 'washout-needed' && z.attrs['data-from-m'] === '650')!;
    expect(Number(sag.children[0].attrs.x1)).toBeCloseTo(e.x(650), 1);
  });

  it('places the devices and the ends as symbols at their chainages', () => {
    const devices = layer(svg, 'devices');
    const kinds = devices.children.map((g) => [g.attrs['data-kind'], Number(g.attrs['data-chainage-m'])]);
    expect(kinds).toEqual([
      ['air-release-valve', 900],
      ['source', 0],
      ['outlet', 1400],
    ]);
  });

  it('labels the axes in the project units and states the exaggeration in use', () => {
    const texts = findAll(layer(svg, 'axes'), (n) => n.tag === 'text');
    const axisText = svgToString(scene.root);
    expect(axisText).toContain('Chainage (m)');
    expect(axisText).toContain('Pressure (kPa)');
    const ratio =
      (scene.frame.elevationBottom - scene.frame.elevationTop) /
      (scene.frame.elevationDomainM[1] - scene.frame.elevationDomainM[0]) /
      ((scene.frame.plotRight - scene.frame.plotLeft) / 1400);
    expect(scene.frame.exaggeration).toBeCloseTo(ratio, 9);
    expect(texts.some((t) => t.attrs['data-role'] === 'exaggeration')).toBe(true);
    const us = svgToString(profileScene(analysis, { units: displayUnits('us'), devices: [], width: 1000 }).root);
    expect(us).toContain('Chainage (ft)');
    expect(us).toContain('Pressure (psi)');
    expect(us).toContain('Pressure head (ft)');
  });

  it('keeps a fixed vertical exaggeration: the elevation span is the panel height over (ratio x horizontal scale)', () => {
    const fixed = profileScene(analysis, { units: metric, devices: [], width: 1000, exaggeration: 10 }).frame;
    const pxPerM = (fixed.plotRight - fixed.plotLeft) / 1400;
    expect(fixed.elevationDomainM[1] - fixed.elevationDomainM[0]).toBeCloseTo(
      (fixed.elevationBottom - fixed.elevationTop) / (10 * pxPerM),
      9,
    );
  });
});

describe('long profile with a break-pressure tank', () => {
  const input = referenceLine();
  const fix = analyzeLine(input).warnings.find((w) => w.code === 'static-over-rating')!.fixes;
  const withTank = applyLineFixes(input, fix);
  const analysis = analyzeLine(withTank);
  const { svg } = drawn(analysis, { devices: withTank.devices });

  it('resets the static line at the tank and ends the grade of the first reach at the head arriving there', () => {
    const e = scales(svg, 'elevation');
    const tank = analysis.tanks[0];
    const statics = findAll(layer(svg, 'static'), (n) => n.attrs['data-role'] === 'static');
    expect(statics.map((n) => Number(n.attrs['data-level-m']))).toEqual([
      412,
      Math.round(tank.waterLevelM * 100) / 100,
    ]);
    expect(e.chainageOf(pathPoints(statics[1].attrs.d)[0][0])).toBeCloseTo(tank.chainageM, 1);
    const grades = findAll(layer(svg, 'grade'), (n) => n.tag === 'path');
    expect(grades).toHaveLength(2);
    const firstReach = pathPoints(grades[0].attrs.d);
    expect(firstReach[firstReach.length - 1][1]).toBeCloseTo(e.y(analysis.reaches[0].arrivingHeadM), 1);
    // Below the tank the grade starts at its water level less the velocity head and entrance loss
    // (profile-and-checks.md §5.2).
    const tankPoint = Array.from(analysis.points.chainageM).findIndex((c) => Math.abs(c - tank.chainageM) < 1e-9);
    const entranceM = tank.waterLevelM - analysis.points.hydraulicGradeM[tankPoint];
    expect(entranceM).toBeCloseTo((1.5 * analysis.points.velocityMs[tankPoint] ** 2) / (2 * 9.80665), 9);
    expect(pathPoints(grades[1].attrs.d)[0][1]).toBeCloseTo(e.y(analysis.points.hydraulicGradeM[tankPoint]), 1);
    const symbol = layer(svg, 'devices').children.find((g) => g.attrs['data-kind'] === 'break-pressure-tank');
    expect(Number(symbol!.attrs['data-chainage-m'])).toBeCloseTo(tank.chainageM, 2);
  });
});

describe('zoom and thinning of a long line', () => {
  it('draws about two points per pixel column and only the points inside the window', () => {
    const input = referenceLine();
    const stations = Array.from({ length: 14001 }, (_, i) => ({
      chainageM: i * 0.1,
      groundElevationM: input.stations[Math.min(Math.floor(i / 100), 140)].groundElevationM + 0.05 * Math.sin(i),
    }));
    const analysis = analyzeLine({ ...input, stations, fittings: [], devices: [] });
    const whole = profileScene(analysis, { units: metric, devices: [], width: 1000 });
    expect(whole.drawnIndices.length).toBeLessThan(stations.length);
    const zoomed = profileScene(analysis, { units: metric, devices: [], width: 1000, view: { fromM: 600, toM: 700 } });
    const c = analysis.points.chainageM;
    const inside = zoomed.drawnIndices.filter((i) => c[i] >= 600 && c[i] <= 700);
    expect(zoomed.drawnIndices.length - inside.length).toBeLessThanOrEqual(2); // one neighbour each side at most
  });
});

describe('ground uncertainty band (issue 13: a walked route shows how far its ground can be trusted)', () => {
  it('draws a band of ± the survey scatter round the ground on a scattered survey, and none on a levelled one', () => {
    const levelled = analyzeLine(referenceLine());
    const walked = analyzeLine({ ...referenceLine(), settings: { ...referenceLine().settings, heightScatterM: 4 } });
    expect(findAll(drawn(levelled).svg, (e) => e.attrs['data-role'] === 'ground-band')).toHaveLength(0);
    const { svg } = drawn(walked);
    const band = findAll(svg, (e) => e.attrs['data-role'] === 'ground-band');
    expect(band).toHaveLength(1);
    expect(band[0].attrs['data-scatter-m']).toBe('4');
    // Its top edge at the first point sits 4 m above the ground, in the chart's own mapping.
    const s = scales(svg, 'elevation');
    const [firstX, firstY] = pathPoints(band[0].attrs.d)[0];
    expect(s.chainageOf(firstX)).toBeCloseTo(0, 6);
    expect(firstY).toBeCloseTo(s.y(walked.points.groundElevationM[0] + 4), 1);
  });
});
