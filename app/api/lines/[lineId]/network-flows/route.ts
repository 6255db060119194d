import { teamRoute } from '@/lib/api/route';
import { networkFlowsOfLine } from '@/lib/data/line-network-flows';
import { teamOfLine } from '@/lib/data/lines';
import { LineParams } from '@/lib/validations/lines';

/** The flow of each piece of the line (it drops at every take-off), from a solve of the project's network. */
export const GET = teamRoute(
  { params: LineParams, permission: 'design.view', teamOf: ({ lineId }) => teamOfLine(lineId) },
  async ({ params }) => ({ flows: await networkFlowsOfLine(params.lineId) }),
);
