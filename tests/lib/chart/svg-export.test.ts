import { XMLValidator } from 'fast-xml-parser';
import { describe, expect, it } from 'vitest';
import { analyzeLine } from '../../../hydraulics/index';
import { profileScene } from '../../../lib/chart/profile-scene';
import { standaloneSvg } from '../../../lib/chart/svg-node';
import { displayUnits } from '../../../lib/units/index';
import { referenceLine } from '../../lines/reference-line';
import { findAll, parseSvg } from './svg-tree';

describe('profile exported as a standalone SVG file', () => {
  const input = referenceLine();
  const analysis = analyzeLine(input);
  const title = 'Kestrel Hollow <spring> line: Spring box & house, revision 3';
  const file = standaloneSvg(
    profileScene(
      analysis,
      { units: displayUnits('metric'), devices: input.devices ?? [], width: 1200, title },
      'export',
    ).root,
  );

  it('is well-formed XML with the SVG namespace and an XML declaration', () => {
    expect(file.startsWith('<?xml version="1.0" encoding="UTF-8"?>\n<svg xmlns="http://www.w3.org/2000/svg"')).toBe(
      true,
    );
    expect(XMLValidator.validate(file)).toBe(true);
  });

  it('carries the expected layers, in drawing order, with no styles from outside the file', () => {
    const svg = parseSvg(file);
    const layers = findAll(svg, (e) => e.attrs['data-layer'] !== undefined).map((e) => e.attrs['data-layer']);
    expect(layers).toEqual([
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
    ]);
    expect(findAll(svg, (e) => e.attrs.class !== undefined || e.tag === 'style')).toEqual([]);
    expect(svg.attrs.viewBox).toMatch(/^0 0 1200 \d+(\.\d+)?$/);
  });

  it('escapes the title and states it twice: as the title element and drawn at the top', () => {
    expect(file).toContain('Kestrel Hollow &lt;spring&gt; line: Spring box &amp; house, revision 3');
    const svg = parseSvg(file);
    expect(svg.children[0].tag).toBe('title');
  });

  it('names every pipe of the line and each device kind in the legend', () => {
    const svg = parseSvg(file);
    const legend = findAll(svg, (e) => e.attrs['data-legend'] !== undefined).map((e) => e.attrs['data-legend']);
    expect(legend).toEqual(
      expect.arrayContaining([
        'ground',
        'pipe:pe80-iso4427-sdr17-40mm',
        'pipe:pe80-iso4427-sdr17-50mm',
        'static',
        'grade',
        'allowable',
        'danger',
        'device:air-release-valve',
      ]),
    );
  });
});
