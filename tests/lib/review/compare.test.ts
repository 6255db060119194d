import { describe, expect, it } from 'vitest';
import { findPipe } from '../../../hydraulics/catalogue/index';
import { EMPTY_SITE_CONTEXT } from '../../../lib/lines/ram-start';
import { compareSnapshots } from '../../../lib/review/compare';
import type { DesignSnapshot, SnapshotLine } from '../../../lib/review/snapshot-types';
import { LineDesignSchema } from '../../../lib/validations/line-design';
import { referenceDesignParts, referenceStations } from '../../lines/reference-line';

const LINE_ID = '00000000-0000-4000-8000-0000000000a1';

function snapshot(line: Partial<SnapshotLine['design']>, tanks: DesignSnapshot['lift']['tanks'] = []): DesignSnapshot {
  const design = LineDesignSchema.parse({ ...referenceDesignParts(), ...line });
  return {
    format: 1,
    project: { name: 'Invented project', description: '', unitSystem: 'metric', siteNotes: '', frostDepthM: null },
    lines: [{
      id: LINE_ID, name: 'Spring box to house', notes: '', routeId: null, routeName: 'Reference route', fromChainageM: null, toChainageM: null,
      design, stations: referenceStations(), context: EMPTY_SITE_CONTEXT, problem: null,
    }],
    lift: { sources: [], yieldReadings: [], ramSites: [], tanks, demandUses: [] },
  };
}

const label = (id: string) => findPipe(id)!.label;

describe('revision compare', () => {
  // Revision 1: the reference line (PE80 SDR 17, 40 mm to ch. 300 then 50 mm; an air-release valve at 900).
  // Revision 2: PE100 SDR 11 50 mm from 300 to 900 m, the valve at 900 taken out, a washout added at 650, a tank added.
  const before = snapshot({});
  const after = snapshot({
    stretches: [
      { fromM: 0, toM: 300, pipe: 'pe80-iso4427-sdr17-40mm' },
      { fromM: 300, toM: 900, pipe: 'pe100-iso4427-sdr11-50mm' },
      { fromM: 900, toM: 1400, pipe: 'pe80-iso4427-sdr17-50mm' },
    ],
    devices: [{ kind: 'washout', chainageM: 650 }],
  }, [{ id: '00000000-0000-4000-8000-0000000000b1', name: 'Knoll tank' } as DesignSnapshot['lift']['tanks'][number]]);

  it('lists exactly the pipe, class and device changes written into the pair', () => {
    const [line] = compareSnapshots(before, after).lines;
    expect(line.change).toBe('changed');
    expect(line.pipes).toEqual([{ fromM: 300, toM: 900, before: label('pe80-iso4427-sdr17-50mm'), after: label('pe100-iso4427-sdr11-50mm') }]);
    expect(line.devices).toEqual([
      { kind: 'washout', chainageM: 650, change: 'added' },
      { kind: 'air-release-valve', chainageM: 900, change: 'removed' },
    ]);
  });

  it('moves the outlet pressure the way the change must: SDR 11 has the smaller bore, so more friction and less head at the house', () => {
    const [line] = compareSnapshots(before, after).lines;
    expect(line.outletHeadM.before).not.toBeNull();
    expect(line.outletHeadM.after!).toBeLessThan(line.outletHeadM.before!);
    expect(line.flowM3s).toEqual({ before: 0.001, after: 0.001 });
  });

  it('names added storage, and finds nothing changed between a revision and itself', () => {
    expect(compareSnapshots(before, after).tanks).toEqual({ added: ['Knoll tank'], removed: [], changed: [] });
    const same = compareSnapshots(before, before);
    expect(same.lines[0]).toMatchObject({ change: 'unchanged', pipes: [], devices: [] });
  });

  it('names network parts added between revisions (a take-off junction)', () => {
    const node = { id: '00000000-0000-4000-8000-0000000000c1', kind: 'junction', name: 'Take-off T1' };
    const withNode = { ...after, network: { projectId: 'p', nodes: [node], links: [], demandUseTies: [] } } as unknown as DesignSnapshot;
    expect(compareSnapshots(before, withNode).networkNodes).toEqual({ added: ['Take-off T1 (junction)'], removed: [], changed: [] });
  });

  it('reports a line only in the later revision as added, and one only in the earlier as removed', () => {
    const empty: DesignSnapshot = { ...before, lines: [] };
    expect(compareSnapshots(empty, after).lines[0].change).toBe('added');
    expect(compareSnapshots(before, empty).lines[0].change).toBe('removed');
  });
});
