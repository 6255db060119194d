import type { CompiledNetwork } from './compile-network';
import { LinkState, type GradientResult } from './gradient-method';
import { nameNodes, type NetworkTopology } from './topology';
import type { NetworkWarning } from './types';

const CAUTION = 'Pressures are estimates: check against local codes and licensed practice before building.';

function round(value: number, digits = 2): number {
  return Number(value.toFixed(digits));
}

/** Net flow leaving a fixed-head node, m³/s. */
function outflowOf(net: CompiledNetwork, node: number, flow: Float64Array): number {
  let out = 0;
  for (let k = 0; k < net.linkCount; k++) {
    if (net.from[k] === node) out += flow[k];
    if (net.to[k] === node) out -= flow[k];
  }
  return out;
}

/** The findings of one solve, as data with plain words. */
export function networkWarnings(
  net: CompiledNetwork,
  topology: NetworkTopology,
  result: GradientResult,
): NetworkWarning[] {
  const warnings: NetworkWarning[] = [];
  if (!result.statesSettled && result.iterations < net.settings.maxIterations) {
    warnings.push({
      code: 'valve-states-unsettled',
      severity: 'danger',
      message:
        'The check valves and pressure-reducing valves kept switching between open and shut: the result is not a steady state. Look for valves that face each other or a valve with no head across it.',
      values: { iterations: result.iterations },
    });
  } else if (!result.converged) {
    warnings.push({
      code: 'not-converged',
      severity: 'danger',
      message: `The solver stopped after ${result.iterations} iterations without settling (last flow change ${result.lastRelativeChange.toExponential(1)} of the total, head balance error ${result.maxHeadBalanceErrorM.toExponential(1)} m): the flows and heads shown are not reliable.`,
      values: {
        iterations: result.iterations,
        relativeChange: result.lastRelativeChange,
        headBalanceErrorM: result.maxHeadBalanceErrorM,
      },
    });
  }
  if (topology.partCount > 1) {
    warnings.push({
      code: 'separate-parts',
      severity: 'info',
      message: `The network is ${topology.partCount} separate systems with no pipe between them; each has its own source or tank.`,
      values: { parts: topology.partCount },
    });
  }
  const visible = net.nodes.length;
  const isolated: string[] = [];
  let isolatedDemand = 0;
  for (let v = 0; v < visible; v++) {
    if (!topology.isolated[v]) continue;
    isolated.push(net.nodeIds[v]);
    isolatedDemand += Math.abs(net.netDemandM3s[v]);
  }
  if (isolated.length > 0) {
    warnings.push({
      code: 'isolated-nodes',
      severity: isolatedDemand > 0 ? 'danger' : 'warning',
      message: `${nameNodes(isolated)} ${isolated.length === 1 ? 'is' : 'are'} cut off from every source and tank by shut valves${isolatedDemand > 0 ? `, so ${(isolatedDemand * 1000).toFixed(2)} L/s of demand gets no water` : ''}.`,
      values: { nodeIds: isolated, demandM3s: isolatedDemand },
    });
  }
  net.nodes.forEach((node, v) => {
    if (topology.isolated[v] || !Number.isNaN(net.fixedHeadM[v])) {
      if (node.kind === 'source' && node.yieldM3s !== undefined && !topology.isolated[v]) {
        const drawn = outflowOf(net, v, result.flowM3s);
        if (drawn > node.yieldM3s * (1 + 1e-9)) {
          warnings.push({
            code: 'source-over-yield',
            severity: 'warning',
            message: `The network draws ${(drawn * 1000).toFixed(2)} L/s from "${node.id}" but its design yield is ${(node.yieldM3s * 1000).toFixed(2)} L/s: the intake will run dry at this demand.`,
            values: { drawnM3s: drawn, yieldM3s: node.yieldM3s },
            elementId: node.id,
          });
        }
      }
      return;
    }
    const pressure = result.headM[v] - node.elevationM;
    if (pressure < 0 && node.kind !== 'break-pressure-tank') {
      warnings.push({
        code: 'negative-pressure',
        severity: 'danger',
        message: `Pressure at "${node.id}" is ${round(pressure)} m of head, below atmospheric: water will not reach it as laid out. ${CAUTION}`,
        values: { pressureHeadM: pressure },
        elementId: node.id,
      });
    } else if (node.minPressureHeadM !== undefined && pressure < node.minPressureHeadM) {
      warnings.push({
        code: 'residual-below-target',
        severity: 'warning',
        message: `"${node.id}" gets ${round(pressure)} m of pressure head, short of the ${round(node.minPressureHeadM)} m it needs.`,
        values: { pressureHeadM: pressure, targetHeadM: node.minPressureHeadM },
        elementId: node.id,
      });
    }
  });
  for (let k = 0; k < net.linkCount; k++) {
    if (net.status[k] !== 'prv' || result.states[k] !== LinkState.Open) continue;
    const hidden = k >= net.visibleLinkCount;
    const tankId = net.nodeIds[net.to[k]];
    warnings.push(
      hidden
        ? {
            code: 'break-pressure-tank-starved',
            severity: 'danger',
            message: `The pipe into break-pressure tank "${tankId}" cannot supply what the outlets below it draw: the tank runs dry and the level falls to ${round(result.headM[net.to[k]])} m.`,
            values: { levelM: result.headM[net.to[k]], setLevelM: net.setHeadM[k] },
            elementId: tankId,
          }
        : {
            code: 'prv-not-reducing',
            severity: 'info',
            message: `Pressure-reducing valve "${net.linkIds[k]}" stands wide open: the head upstream is below its setting, so it passes the flow without reducing pressure.`,
            values: { setHeadM: net.setHeadM[k], upstreamHeadM: result.headM[net.from[k]] },
            elementId: net.linkIds[k],
          },
    );
  }
  return warnings;
}
