import { teamRoute } from '@/lib/api/route';
import { createNetworkNode } from '@/lib/data/network';
import { teamOfProject } from '@/lib/data/projects';
import { TakeOffSchema } from '@/lib/validations/network';
import { ProjectParams } from '@/lib/validations/projects';

const teamOf = ({ projectId }: { projectId: string }) => teamOfProject(projectId);

/** A take-off placed on a line's long profile: a junction node on the line at that chainage. */
export const POST = teamRoute(
  { params: ProjectParams, body: TakeOffSchema, permission: 'design.edit', teamOf, status: 201 },
  async ({ params, body }) => ({
    node: await createNetworkNode(params.projectId, {
      kind: 'junction', name: body.name, elevationM: null, waterSourceId: null, ramSiteId: null, tankId: null,
      lineId: body.lineId, chainageM: body.chainageM, eastM: null, northM: null, data: {}, notes: '',
    }),
  }),
);
