import { describe, expect, it } from 'vitest';
import { findPipe, PIPE_SERIES, PER_PERSON_DEMAND_FIGURES } from '../../../hydraulics/index';
import { startingDesign } from '../../../lib/lines/default-design';
import { formatQuantity, unitDefaults } from '../../../lib/units';

/** Defaults chosen for the unit system (docs/references/profile-and-checks.md §7.1). */
describe('defaults by unit system', () => {
  const metric = unitDefaults('metric');
  const us = unitDefaults('us');

  it('a US project starts on ASTM pipe, a metric one on ISO 4427, and every default pipe is in the catalogue', () => {
    for (const id of [us.linePipeId, us.networkPipeId]) expect(findPipe(id)?.source, id).toMatch(/ASTM/);
    for (const id of [metric.linePipeId, metric.networkPipeId]) expect(findPipe(id)?.source, id).toMatch(/ISO 4427/);
    expect(PIPE_SERIES.find((s) => s.id === us.pipeSeriesId)?.label).toMatch(/ASTM/);
    expect(PIPE_SERIES.find((s) => s.id === metric.pipeSeriesId)?.label).toMatch(/ISO 4427/);
  });

  it('the two starting pipes have the same bore within 4 % and a like rating (§7.1, computed)', () => {
    for (const key of ['linePipeId', 'networkPipeId'] as const) {
      const a = findPipe(us[key])!;
      const b = findPipe(metric[key])!;
      expect(Math.abs(a.insideDiameterM / b.insideDiameterM - 1)).toBeLessThan(0.04);
      // 200 psi = 1.379 MPa against PN 16 = 1.6 MPa: the strongest ASTM PE class the catalogue holds.
      expect(a.pressureRatingPa / b.pressureRatingPa).toBeGreaterThan(0.85);
    }
  });

  it('cover in round feet for a US project, 0.75 m for a metric one; water at 20 °C shown as 68 °F; a fresh design flow in round gpm', () => {
    expect(formatQuantity('depth', us.coverM, 'us')).toBe('2.50 ft');
    expect(formatQuantity('depth', metric.coverM, 'metric')).toBe('0.75 m');
    expect(formatQuantity('temperature', us.waterTemperatureC, 'us')).toBe('68 °F');
    expect(formatQuantity('designFlow', us.designFlowM3s, 'us')).toBe('15.0 US gpm');
    expect(formatQuantity('designFlow', metric.designFlowM3s, 'metric')).toBe('1.00 L/s');
    expect(formatQuantity('temperature', metric.waterTemperatureC, 'metric')).toBe('20 °C');
  });

  it("a person's daily use starts on the figure printed in the project's units", () => {
    expect(PER_PERSON_DEMAND_FIGURES.find((f) => f.id === us.perPersonFigureId)?.published.unit).toMatch(/US gal/);
    expect(PER_PERSON_DEMAND_FIGURES.find((f) => f.id === metric.perPersonFigureId)?.published.unit).toMatch(/^L\//);
  });

  it("a new line's starting design follows the project's units", () => {
    const stations = [
      { chainageM: 0, groundElevationM: 240 },
      { chainageM: 400, groundElevationM: 200 },
    ];
    expect(startingDesign(stations, 'us')).toMatchObject({
      stretches: [{ fromM: 0, toM: 400, pipe: 'pe-d2239-sidr7-1.5in' }],
      settings: { defaultCoverM: 0.762 },
    });
    expect(startingDesign(stations, 'metric')).toMatchObject({
      stretches: [{ fromM: 0, toM: 400, pipe: 'pe100-iso4427-sdr11-50mm' }],
      settings: {},
    });
  });
});
