import { HydraulicsInputError, type NetworkSolution, type NetworkWarning } from '../../hydraulics/index';
import { elementError, type BuiltNetwork } from './network-input';
import type { NetworkRecords } from './records';
import type { LinkResult, NetworkRunWarning, NodeResult, SolveRunResult } from './run-result';

/** A core finding placed on the record it is about (a line piece -> its line link and chainage). */
export function recordWarning(built: BuiltNetwork, warning: NetworkWarning): NetworkRunWarning {
  // The core names elements by id; people read them by name.
  const message = warning.message.replace(/"([^"]+)"/g, (quoted, key: string) =>
    built.names[key] ? `"${built.names[key]}"` : quoted,
  );
  const base = { code: warning.code, severity: warning.severity, message };
  const id = warning.elementId;
  if (!id) return base;
  const piece = built.pieces[id];
  if (piece)
    return {
      ...base,
      linkId: piece.linkId,
      ...(piece.fromChainageM !== null ? { chainageM: piece.fromChainageM } : {}),
    };
  if (built.recordNodeIds.includes(id)) return { ...base, nodeId: id };
  const inside = /^(.+)@([\d.]+)$/.exec(id);
  if (inside) return { ...base, linkId: inside[1], chainageM: Number(inside[2]) };
  return base;
}

/** The core's answer keyed by the records: heads per record node, flows per record link and piece. */
export function solveRunResult(built: BuiltNetwork, solution: NetworkSolution): SolveRunResult {
  const coreNodes = new Map(built.input.nodes.map((n) => [n.id, n]));
  const nodes: NodeResult[] = built.recordNodeIds.map((nodeId) => {
    const node = coreNodes.get(nodeId)!;
    return {
      nodeId,
      elevationM: node.elevationM,
      headM: solution.headsM[nodeId] ?? null,
      pressureHeadM: solution.pressureHeadsM[nodeId] ?? null,
      demandM3s: (node.demandM3s ?? 0) - (node.inflowM3s ?? 0),
      minPressureHeadM: node.minPressureHeadM ?? null,
    };
  });
  const byLink = new Map<string, LinkResult>();
  const pipeOf = new Map(built.input.links.map((l) => [l.id, l.pipe]));
  for (const [coreId, piece] of Object.entries(built.pieces)) {
    const pipe = pipeOf.get(coreId);
    const insideDiameterM = typeof pipe === 'object' && pipe ? pipe.insideDiameterM : Number.NaN;
    const entry = byLink.get(piece.linkId) ?? { linkId: piece.linkId, flowM3s: 0, pieces: [] };
    entry.pieces.push({
      fromChainageM: piece.fromChainageM,
      toChainageM: piece.toChainageM,
      pipeId: piece.pipeId,
      pipeLabel: piece.pipeLabel,
      insideDiameterM,
      flowM3s: solution.flowsM3s[coreId] ?? 0,
      velocityMs: solution.velocitiesMs[coreId] ?? 0,
      headLossM: solution.headLossesM[coreId] ?? 0,
    });
    byLink.set(piece.linkId, entry);
  }
  const links = [...byLink.values()].map((link) => {
    link.pieces.sort((a, b) => (a.fromChainageM ?? 0) - (b.fromChainageM ?? 0));
    return { ...link, flowM3s: link.pieces[0]?.flowM3s ?? 0 };
  });
  const warnings: NetworkRunWarning[] = [
    ...built.notes.map((note) => ({ ...note, code: 'network.assumed-figure', severity: 'info' as const })),
    ...solution.warnings.map((warning) => recordWarning(built, warning)),
  ];
  return {
    kind: 'solve',
    friction: { method: solution.frictionMethod, freeSurfaceLosses: solution.freeSurfaceLosses },
    converged: solution.converged,
    iterations: solution.iterations,
    nodes,
    links,
    warnings,
  };
}

/** A core input error that names an array position, restated on the record it came from. */
export function explainCoreError(built: BuiltNetwork, records: NetworkRecords, error: unknown): unknown {
  if (!(error instanceof HydraulicsInputError) || error.index === undefined) return error;
  const field = error.field;
  const reason = error.message.replace(/^[^:]*:\s*/, '');
  if (field.startsWith('nodes')) {
    const core = built.input.nodes[error.index];
    const record = records.nodes.find((n) => n.id === core?.id);
    if (record) return elementError('nodes', record, field.replace(/^nodes\.?/, '') || 'kind', reason);
    const inside = core ? /^(.+)@/.exec(core.id) : null;
    const link = inside ? records.links.find((l) => l.id === inside[1]) : undefined;
    if (link) return elementError('links', link, 'pipe', reason);
  }
  if (field.startsWith('links')) {
    const core = built.input.links[error.index];
    const piece = core ? built.pieces[core.id] : undefined;
    const record = piece ? records.links.find((l) => l.id === piece.linkId) : undefined;
    if (record) return elementError('links', record, field.replace(/^links\.?/, '') || 'kind', reason);
  }
  return error;
}
