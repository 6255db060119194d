import { teamRoute } from '@/lib/api/route';
import { createNetworkNode } from '@/lib/data/network';
import { inProjectUnits, teamOfProject } from '@/lib/data/projects';
import { TAKE_OFF_WORDS } from '@/lib/validations/field-word-tables';
import { TakeOffSchema } from '@/lib/validations/network';
import { ProjectParams } from '@/lib/validations/projects';

const teamOf = ({ projectId }: { projectId: string }) => teamOfProject(projectId);

/** A take-off placed on a line's long profile: a junction node on the line at that chainage. */
export const POST = teamRoute(
  {
    params: ProjectParams,
    body: TakeOffSchema,
    bodyWords: inProjectUnits(TAKE_OFF_WORDS),
    permission: 'design.edit',
    teamOf,
    status: 201,
  },
  async ({ params, body }) => ({
    node: await createNetworkNode(params.projectId, {
      kind: 'junction',
      name: body.name,
      elevationM: null,
      waterSourceId: null,
      ramSiteId: null,
      tankId: null,
      lineId: body.lineId,
      chainageM: body.chainageM,
      eastM: null,
      northM: null,
      data: {},
      notes: '',
    }),
  }),
);
