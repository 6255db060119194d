import { describe, expect, it } from 'vitest';
import { analyzeLine } from '../../hydraulics/index';
import { buildNetworkOfProject } from '../../migrations/support/network-from-records.cjs';
import { models } from '../../models';
import { analyseSavedLine } from '../../lib/data/line-analysis';
import { loadLiftRecords } from '../../lib/data/lift-summary';
import { getLine, stationsOfLine } from '../../lib/data/lines';
import { loadNetworkContext } from '../../lib/data/network-context';
import { readNetworkRecords } from '../../lib/data/network-records';
import { pumpOutletHeadOf } from '../../lib/lift/pump-outlet';
import { buildLiftSummary } from '../../lib/lift/summary';
import { lineInputOf } from '../../lib/lines/line-input';
import { solveNetworkRun } from '../../lib/network/run-network';

// The demo seed (seeders/) is in the test database: Kestrel Hollow (two spring lines) and
// Brackwater Creek (the Weir ram, the Harrow Knoll tank, the delivery line and three demand uses).
const KESTREL = '6f1c1e52-3a57-4c38-9b0e-0d5b1c7a2001';
const BRACKWATER = '6f1c1e52-3a57-4c38-9b0e-0d5b1c7a2002';

/** The analysis as it was computed before the network existed: ram heads from the whole lift summary. */
async function analysisBeforeNetwork(lineId: string) {
  const line = (await getLine(lineId))!;
  const stations = await stationsOfLine(line.routeId!, line);
  const summary = buildLiftSummary(await loadLiftRecords(line.projectId));
  const ramOutlets = summary.ramSites.flatMap(({ site, plan, tank }) =>
    plan.ok ? [pumpOutletHeadOf(site, tank, plan.value)] : [],
  );
  const project = await models().Project.findByPk(line.projectId);
  return analyzeLine(lineInputOf(line.design, stations, { ramOutlets, frostDepthM: project?.frostDepthM ?? null }));
}

async function rebuild(projectId: string) {
  const { NetworkNode, sequelize } = models();
  await NetworkNode.destroy({ where: { projectId } });
  await sequelize.transaction((transaction) => buildNetworkOfProject(sequelize, transaction, projectId));
}

describe('network migration of the demo', () => {
  it('joins every saved line, ram site and tank into one network per project and keeps every row', async () => {
    const m = models();
    const before = {
      lines: await m.Line.count(),
      tanks: await m.Tank.count(),
      ramSites: await m.RamSite.count(),
      uses: await m.DemandUse.count(),
    };
    await rebuild(BRACKWATER);
    await rebuild(KESTREL);
    expect({
      lines: await m.Line.count(),
      tanks: await m.Tank.count(),
      ramSites: await m.RamSite.count(),
      uses: await m.DemandUse.count(),
    }).toEqual(before);

    const brackwater = await readNetworkRecords(BRACKWATER);
    const lines = await m.Line.findAll({ where: { projectId: BRACKWATER } });
    for (const line of lines) expect(brackwater.links.filter((l) => l.lineId === line.id)).toHaveLength(1);
    const ram = brackwater.nodes.find((n) => n.kind === 'ram-outlet');
    const tank = brackwater.nodes.find((n) => n.kind === 'tank');
    expect(ram?.ramSiteId).toBe('6f1c1e52-3a57-4c38-9b0e-0d5b1c7a4001');
    expect(tank?.tankId).not.toBeNull();
    // The ram's delivery pipe joins the ram outlet to its tank.
    expect(brackwater.links.some((l) => l.kind === 'pipe' && l.fromNodeId === ram!.id && l.toNodeId === tank!.id)).toBe(
      true,
    );
    // Its uses could not be tied to an outlet they serve (the only line end is a tank inlet): the tank says so.
    expect(tank!.notes).toMatch(/not tied to an outlet/);

    const kestrel = await readNetworkRecords(KESTREL);
    expect(kestrel.links.filter((l) => l.kind === 'line')).toHaveLength(2);
    expect(kestrel.nodes.filter((n) => n.kind === 'source').map((n) => n.data.waterLevelM)).toEqual([412, 412]);
    expect(
      kestrel.nodes
        .filter((n) => n.kind === 'outlet')
        .every((n) => n.data.demandFrom === 'fixed' && n.data.fixedDemandM3s === 0.001),
    ).toBe(true);
  });

  it('gives every demo line the same analysis as before the network, and the network carries each line its design flow', async () => {
    for (const projectId of [KESTREL, BRACKWATER]) {
      const context = await loadNetworkContext(projectId);
      const solve = solveNetworkRun(context);
      expect(solve.converged).toBe(true);
      for (const link of context.records.links.filter((l) => l.kind === 'line')) {
        const now = await analyseSavedLine(link.lineId!);
        const before = await analysisBeforeNetwork(link.lineId!);
        expect(now.analysis.flowM3s).toBeCloseTo(before.flowM3s, 12);
        expect(now.analysis.warnings.map((w) => w.code)).toEqual(before.warnings.map((w) => w.code));
        // The network's flows carry the solver's rounding (1e-16 m³/s): the grades agree to a micrometre.
        const close = (a: ArrayLike<number>, b: ArrayLike<number>) => {
          expect(a.length).toBe(b.length);
          for (let i = 0; i < a.length; i++) expect(Math.abs(a[i] - b[i])).toBeLessThan(1e-6);
        };
        close(now.analysis.points.hydraulicGradeM, before.points.hydraulicGradeM);
        close(now.analysis.points.staticHeadM, before.points.staticHeadM);
        const design = context.lines.find((l) => l.id === link.lineId)!.design.flow;
        if (design.kind === 'design') {
          const solved = solve.links.find((l) => l.linkId === link.id)!;
          expect(solved.flowM3s).toBeCloseTo(design.flowM3s, 9);
        }
      }
    }
  });
});
