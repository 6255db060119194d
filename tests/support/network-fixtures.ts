import { models } from '../../models';
import { createNetworkLink, createNetworkNode } from '../../lib/data/network';
import { NetworkLinkSchema, NetworkNodeSchema } from '../../lib/validations/network';

/** A spring intake at 120 m and a tap at 100 m drawing 0.2 L/s (invented). */
export const sourceNodeBody = () => ({
  kind: 'source',
  name: 'Fixture intake',
  elevationM: 120,
  data: { waterLevelM: 120 },
});
export const outletNodeBody = () => ({
  kind: 'outlet',
  name: 'Fixture tap',
  elevationM: 100,
  data: { outletKind: 'tap', residualHeadM: 3, demandFrom: 'fixed', fixedDemandM3s: 0.0002 },
});
export const pipeLinkBody = (fromNodeId: string, toNodeId: string) => ({
  kind: 'pipe',
  name: 'Fixture pipe',
  fromNodeId,
  toNodeId,
  data: { lengthM: 250, pipe: 'pe100-iso4427-sdr11-32mm' },
});

export async function createNodeFixture(
  projectId: string,
  body: ReturnType<typeof sourceNodeBody> | ReturnType<typeof outletNodeBody>,
) {
  return createNetworkNode(projectId, NetworkNodeSchema.parse(body));
}

/** Intake -> pipe -> tap: the smallest network that solves. */
export async function createPipeNetworkFixture(projectId: string) {
  const source = await createNodeFixture(projectId, sourceNodeBody());
  const outlet = await createNodeFixture(projectId, outletNodeBody());
  const link = await createNetworkLink(projectId, NetworkLinkSchema.parse(pipeLinkBody(source.id, outlet.id)));
  return { source, outlet, link };
}

/**
 * A finished sizing run of a fresh intake -> pipe -> tap network that chose a 40 mm pipe (as a worker would leave it).
 */
export async function createSizedJobFixture(projectId: string) {
  const { link } = await createPipeNetworkFixture(projectId);
  const piece = {
    fromChainageM: null,
    toChainageM: null,
    pipeId: 'pe100-iso4427-sdr11-40mm',
    pipeLabel: '40 mm',
    insideDiameterM: 0.0326,
    flowM3s: 0.0002,
    velocityMs: 0.24,
    headLossM: 0.5,
  };
  const result = {
    kind: 'size',
    feasible: true,
    cost: 250,
    uniform: null,
    warnings: [],
    solution: {
      kind: 'solve',
      converged: true,
      iterations: 3,
      nodes: [],
      links: [{ linkId: link.id, flowM3s: 0.0002, pieces: [piece] }],
      warnings: [],
    },
  };
  return models().NetworkJob.create({ projectId, kind: 'size', status: 'done', progress: 1, result });
}
