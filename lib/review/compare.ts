import type { LineAnalysis, LineDevice } from '../../hydraulics/index';
import { lineAnswers } from '../lines/answers';
import { designCost, type DesignCost } from './cost';
import { analyseSnapshotLine } from './snapshot-analysis';
import type { DesignSnapshot, SnapshotLine } from './snapshot-types';

/** One chainage range whose pipe differs between the two revisions (size, class or material). */
export interface PipeChange {
  fromM: number;
  toM: number;
  before: string | null;
  after: string | null;
}

export interface DeviceChange {
  kind: LineDevice['kind'];
  chainageM: number;
  change: 'added' | 'removed';
}

export interface LineComparison {
  lineId: string;
  name: string;
  change: 'added' | 'removed' | 'changed' | 'unchanged';
  pipes: PipeChange[];
  devices: DeviceChange[];
  /** Residual pressure head at the end of the line (the outlet), m; null when that side could not be analysed. */
  outletHeadM: { before: number | null; after: number | null };
  flowM3s: { before: number | null; after: number | null };
}

export interface RevisionComparison {
  lines: LineComparison[];
  tanks: { added: string[]; removed: string[]; changed: string[] };
  ramSites: { added: string[]; removed: string[]; changed: string[] };
  demandUses: { added: string[]; removed: string[]; changed: string[] };
  /** Network nodes (take-offs, outlets, tanks...) and links; empty when neither revision froze a network. */
  networkNodes: { added: string[]; removed: string[]; changed: string[] };
  networkLinks: { added: string[]; removed: string[]; changed: string[] };
  /** Pipe material cost at each revision's frozen price list; null on a side that froze none. */
  cost: { before: DesignCost | null; after: DesignCost | null; difference: number | null };
  /** Residual pressure head at each network outlet in each revision's frozen peak-hour solve. */
  outlets: OutletPressureChange[];
  /**
   * Why a side has no outlet pressures (no network, not solved, made before solves were frozen); null when it has them.
   */
  outletsMissing: { before: string | null; after: string | null };
}

export interface OutletPressureChange {
  nodeId: string;
  name: string;
  /** Pressure head at the outlet, m; null when the outlet is not on that side or was not solved. */
  before: number | null;
  after: number | null;
  /** The residual the outlet asks for, m (the later revision's, else the earlier's). */
  minimumM: number | null;
  change: 'added' | 'removed' | 'changed' | 'unchanged';
}

const KEY_DECIMALS = 100;
const sameNumber = (a: number | null, b: number | null) =>
  a === null || b === null ? a === b : Math.abs(a - b) < 1e-6;

function pipeRuns(a: LineAnalysis | null): { fromM: number; toM: number; label: string }[] {
  return a ? a.stretches.map((s) => ({ fromM: s.fromM, toM: s.toM, label: s.pipe.label })) : [];
}

/** Ranges where the pipe laid differs, merged where neighbouring ranges changed the same way. */
export function pipeChanges(before: LineAnalysis | null, after: LineAnalysis | null): PipeChange[] {
  const a = pipeRuns(before);
  const b = pipeRuns(after);
  const cuts = [...new Set([...a, ...b].flatMap((r) => [r.fromM, r.toM]))].sort((x, y) => x - y);
  const at = (runs: typeof a, c: number) => runs.find((r) => r.fromM <= c && c < r.toM)?.label ?? null;
  const out: PipeChange[] = [];
  for (let i = 0; i < cuts.length - 1; i++) {
    const mid = (cuts[i] + cuts[i + 1]) / 2;
    const was = at(a, mid);
    const now = at(b, mid);
    if (was === now) continue;
    const last = out[out.length - 1];
    if (last && last.toM === cuts[i] && last.before === was && last.after === now) last.toM = cuts[i + 1];
    else out.push({ fromM: cuts[i], toM: cuts[i + 1], before: was, after: now });
  }
  return out;
}

function deviceKey(d: LineDevice): string {
  return `${d.kind}@${Math.round(d.chainageM * KEY_DECIMALS)}`;
}

export function deviceChanges(before: readonly LineDevice[], after: readonly LineDevice[]): DeviceChange[] {
  const was = new Set(before.map(deviceKey));
  const now = new Set(after.map(deviceKey));
  return [
    ...before
      .filter((d) => !now.has(deviceKey(d)))
      .map((d) => ({ kind: d.kind, chainageM: d.chainageM, change: 'removed' as const })),
    ...after
      .filter((d) => !was.has(deviceKey(d)))
      .map((d) => ({ kind: d.kind, chainageM: d.chainageM, change: 'added' as const })),
  ].sort((x, y) => x.chainageM - y.chainageM);
}

function compareLine(
  before: SnapshotLine | null,
  after: SnapshotLine | null,
  ab: LineAnalysis | null,
  aa: LineAnalysis | null,
): LineComparison {
  const outlet = (a: LineAnalysis | null) => (a ? lineAnswers(a).endResidualHeadM : null);
  const result: LineComparison = {
    lineId: (after ?? before)!.id,
    name: (after ?? before)!.name,
    change: !before ? 'added' : !after ? 'removed' : 'unchanged',
    pipes: pipeChanges(ab, aa),
    devices: deviceChanges(before?.design.devices ?? [], after?.design.devices ?? []),
    outletHeadM: { before: outlet(ab), after: outlet(aa) },
    flowM3s: { before: ab?.flowM3s ?? null, after: aa?.flowM3s ?? null },
  };
  if (result.change === 'unchanged') {
    const designMoved =
      JSON.stringify(before!.design) !== JSON.stringify(after!.design) ||
      JSON.stringify(before!.stations) !== JSON.stringify(after!.stations);
    const figuresMoved =
      !sameNumber(result.outletHeadM.before, result.outletHeadM.after) ||
      !sameNumber(result.flowM3s.before, result.flowM3s.after);
    if (designMoved || figuresMoved || result.pipes.length > 0 || result.devices.length > 0) result.change = 'changed';
  }
  return result;
}

function compareNamed<T extends { id: string; name?: string; label?: string }>(
  before: readonly T[],
  after: readonly T[],
) {
  const name = (x: T) => x.name ?? x.label ?? x.id;
  const was = new Map(before.map((x) => [x.id, x]));
  const now = new Map(after.map((x) => [x.id, x]));
  return {
    added: after.filter((x) => !was.has(x.id)).map(name),
    removed: before.filter((x) => !now.has(x.id)).map(name),
    changed: after.filter((x) => was.has(x.id) && JSON.stringify(was.get(x.id)) !== JSON.stringify(x)).map(name),
  };
}

/** A network part under a name a person reads: "take-off T1 (junction)". */
function named<T extends { id: string; name: string; kind: string }>(part: T): T {
  return { ...part, name: `${part.name} (${part.kind})` };
}

/** Why a revision has no outlet pressures to compare, or null when it has them. */
function outletsMissing(snapshot: DesignSnapshot): string | null {
  if (snapshot.networkSolve === undefined) return 'made before network solves were kept with a revision';
  if (snapshot.networkSolve === null) return 'no network';
  return snapshot.networkSolve.ok ? null : `the network did not solve: ${snapshot.networkSolve.problem}`;
}

function outletPressures(
  snapshot: DesignSnapshot,
): Map<string, { name: string; headM: number | null; minimumM: number | null }> {
  const solved = snapshot.networkSolve?.ok
    ? new Map(snapshot.networkSolve.result.nodes.map((n) => [n.nodeId, n]))
    : null;
  return new Map(
    (snapshot.network?.nodes ?? [])
      .filter((n) => n.kind === 'outlet')
      .map((n) => {
        const result = solved?.get(n.id);
        return [
          n.id,
          {
            name: n.name,
            headM: result?.pressureHeadM ?? null,
            minimumM: result?.minPressureHeadM ?? n.data.residualHeadM ?? null,
          },
        ];
      }),
  );
}

/** Each network outlet's residual pressure head in the two frozen solves, outlets in the later revision first. */
export function compareOutlets(before: DesignSnapshot, after: DesignSnapshot): OutletPressureChange[] {
  const was = outletPressures(before);
  const now = outletPressures(after);
  const ids = [...new Set([...now.keys(), ...was.keys()])];
  return ids.map((nodeId) => {
    const a = was.get(nodeId);
    const b = now.get(nodeId);
    const change = !a ? 'added' : !b ? 'removed' : sameNumber(a.headM, b.headM) ? 'unchanged' : 'changed';
    return {
      nodeId,
      name: (b ?? a)!.name,
      before: a?.headM ?? null,
      after: b?.headM ?? null,
      minimumM: (b ?? a)!.minimumM,
      change,
    };
  });
}

/** Each line of a revision analysed as frozen (null: it could not be). */
function analysesOf(snapshot: DesignSnapshot): Map<string, LineAnalysis | null> {
  return new Map(snapshot.lines.map((line) => [line.id, analyseSnapshotLine(line)]));
}

/**
 * What changed from `before` to `after`: lines (pipes, sizes and classes, devices, outlet pressure, flow), tanks, ram
 * sites, demand, the network, its outlet pressures and the pipe cost.
 */
export function compareSnapshots(before: DesignSnapshot, after: DesignSnapshot): RevisionComparison {
  const ids = [...new Set([...before.lines.map((l) => l.id), ...after.lines.map((l) => l.id)])];
  const find = (s: DesignSnapshot, id: string) => s.lines.find((l) => l.id === id) ?? null;
  const analysedBefore = analysesOf(before);
  const analysedAfter = analysesOf(after);
  const costBefore = designCost(before, analysedBefore);
  const costAfter = designCost(after, analysedAfter);
  return {
    lines: ids.map((id) =>
      compareLine(find(before, id), find(after, id), analysedBefore.get(id) ?? null, analysedAfter.get(id) ?? null),
    ),
    tanks: compareNamed(before.lift.tanks, after.lift.tanks),
    ramSites: compareNamed(before.lift.ramSites, after.lift.ramSites),
    demandUses: compareNamed(before.lift.demandUses, after.lift.demandUses),
    networkNodes: compareNamed((before.network?.nodes ?? []).map(named), (after.network?.nodes ?? []).map(named)),
    networkLinks: compareNamed((before.network?.links ?? []).map(named), (after.network?.links ?? []).map(named)),
    cost: {
      before: costBefore,
      after: costAfter,
      difference: costBefore && costAfter ? costAfter.total - costBefore.total : null,
    },
    outlets: compareOutlets(before, after),
    outletsMissing: { before: outletsMissing(before), after: outletsMissing(after) },
  };
}
