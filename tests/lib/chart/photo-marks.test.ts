import { describe, expect, it } from 'vitest';
import { analyzeLine } from '../../../hydraulics/index';
import { numberPhotos, type ChartPhoto } from '../../../lib/chart/photo-marks';
import { planScene } from '../../../lib/chart/plan-scene';
import { valueAt } from '../../../lib/chart/profile-marks';
import { profileScene } from '../../../lib/chart/profile-scene';
import { svgToString } from '../../../lib/chart/svg-node';
import { displayUnits } from '../../../lib/units/index';
import { referenceLine } from '../../lines/reference-line';
import { findAll, layer, parseSvg } from './svg-tree';

const metric = displayUnits('metric');
const analysis = analyzeLine(referenceLine());
const c = analysis.points.chainageM;
const lastM = c[c.length - 1];

const photos: ChartPhoto[] = numberPhotos([
  { id: 'b', chainageM: 812.5, caption: 'Creek crossing', fileName: 'IMG_2.jpg' },
  { id: 'a', chainageM: 278, caption: '', fileName: 'spring-box.jpg' },
  { id: 'z', chainageM: null, caption: 'not placed', fileName: 'IMG_9.jpg' },
]);

function drawn(view?: { fromM: number; toM: number }) {
  const scene = profileScene(analysis, { units: metric, devices: [], width: 1000, photos, view }, 'test');
  return { scene, svg: parseSvg(svgToString(scene.root)) };
}

describe('site photos on the long profile', () => {
  it('numbers placed photos along the route and leaves out the unplaced', () => {
    expect(photos.map((p) => [p.id, p.number, p.label])).toEqual([
      ['a', 1, 'spring-box.jpg'],
      ['b', 2, 'Creek crossing'],
    ]);
  });

  it('marks each photo at its chainage, its stem standing on the ground there', () => {
    const { svg } = drawn();
    const g = findAll(svg, (e) => e.attrs['data-panel'] === 'elevation')[0];
    const [left, right] = g.attrs['data-x-range'].split(' ').map(Number);
    const [bottom, top] = g.attrs['data-y-range'].split(' ').map(Number);
    const [lo, hi] = g.attrs['data-y-domain-m'].split(' ').map(Number);
    const marks = findAll(layer(svg, 'photos'), (e) => e.attrs['data-photo-id'] !== undefined);
    expect(marks.map((m) => m.attrs['data-photo-id'])).toEqual(['a', 'b']);
    for (const [mark, chainage] of [
      [marks[0], 278],
      [marks[1], 812.5],
    ] as const) {
      // x by hand from the axis the drawing states: the line runs from c[0] to lastM across the plot.
      const xByHand = left + ((chainage - c[0]) / (lastM - c[0])) * (right - left);
      expect(Number(mark.attrs['data-x'])).toBeCloseTo(xByHand, 1);
      const stem = findAll(mark, (e) => e.tag === 'line')[0];
      expect(Number(stem.attrs.x1)).toBeCloseTo(xByHand, 1);
      const groundByHand =
        bottom + ((valueAt(c, analysis.points.groundElevationM, chainage) - lo) / (hi - lo)) * (top - bottom);
      expect(Number(stem.attrs.y2)).toBeCloseTo(groundByHand, 1);
    }
    expect(svgToString(drawn().scene.root)).toContain('<title>Photo 2 at 812.5 m: Creek crossing</title>');
    expect(findAll(layer(svg, 'legend'), (e) => e.attrs['data-legend'] === 'photos')).toHaveLength(1);
    // Marks a person can point at make the drawing a labelled group; without them it stays an image.
    expect(svg.attrs.role).toBe('group');
    expect(
      parseSvg(svgToString(profileScene(analysis, { units: metric, devices: [], width: 1000 }).root)).attrs.role,
    ).toBe('img');
  });

  it('draws only the photos inside the chainage window shown', () => {
    const { svg } = drawn({ fromM: 600, toM: 1000 });
    const marks = findAll(layer(svg, 'photos'), (e) => e.attrs['data-photo-id'] !== undefined);
    expect(marks.map((m) => m.attrs['data-photo-id'])).toEqual(['b']);
    const g = findAll(svg, (e) => e.attrs['data-panel'] === 'elevation')[0];
    const [left, right] = g.attrs['data-x-range'].split(' ').map(Number);
    expect(Number(marks[0].attrs['data-x'])).toBeCloseTo(left + ((812.5 - 600) / 400) * (right - left), 1);
  });

  it('on the plan, a photo with a position is drawn there and joined to the line at its chainage; one without sits on the line', () => {
    // A route due north: 0.001° of latitude per 100 m station (close enough for a drawing test).
    const stations = Array.from({ length: 11 }, (_, i) => ({
      chainageM: i * 100,
      latitudeDeg: 54 + i * 0.0009,
      longitudeDeg: -2.9,
    }));
    const onPlan: ChartPhoto[] = [
      { id: 'east', chainageM: 500, number: 1, label: 'east of the line', latitudeDeg: 54.0045, longitudeDeg: -2.899 },
      { id: 'picked', chainageM: 300, number: 2, label: 'picked', latitudeDeg: null, longitudeDeg: null },
      { id: 'beyond', chainageM: 5000, number: 3, label: 'past the end', latitudeDeg: null, longitudeDeg: null },
    ];
    const scene = planScene(stations, [], [], { width: 320, height: 320 }, metric, onPlan)!;
    expect(scene.photos.map((p) => p.photo.id)).toEqual(['east', 'picked']);
    const station = (i: number) => scene.positions.find((p) => p.index === i)!;
    const [east, picked] = scene.photos;
    // Same row as station 5 (same latitude), to its right (east), by 0.001° of longitude at 54° N ≈ 65.5 m.
    expect(east.y).toBeCloseTo(station(5).y, 0);
    expect(east.x - station(5).x).toBeCloseTo(
      (((6_371_008.8 * 0.001 * Math.PI) / 180) * Math.cos((54.0045 * Math.PI) / 180)) / scene.metresPerPx,
      0,
    );
    expect(east.onLine).toEqual({ x: station(5).x, y: station(5).y });
    expect({ x: picked.x, y: picked.y }).toEqual({ x: station(3).x, y: station(3).y });
    const svg = parseSvg(svgToString(scene.root));
    expect(findAll(layer(svg, 'plan-photos'), (e) => e.attrs['data-photo-id'] !== undefined)).toHaveLength(2);
  });
});
