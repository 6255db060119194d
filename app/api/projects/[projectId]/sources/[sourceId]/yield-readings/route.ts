import { teamRoute } from '@/lib/api/route';
import { teamOfProject } from '@/lib/data/projects';
import { addYieldReading } from '@/lib/data/water-sources';
import { SourceParams } from '@/lib/validations/lift-common';
import { YieldReadingSchema } from '@/lib/validations/water-sources';

/** Surveyors log yield readings too ('yield.log'): measuring a source is field work. */
export const POST = teamRoute(
  {
    params: SourceParams,
    body: YieldReadingSchema,
    permission: 'yield.log',
    teamOf: ({ projectId }) => teamOfProject(projectId),
    status: 201,
  },
  async ({ params, body, user }) => ({
    reading: await addYieldReading(params.projectId, params.sourceId, user.id, body),
  }),
);
