import { teamRoute } from '@/lib/api/route';
import { getRevision, teamOfRevision } from '@/lib/data/revisions';
import { RevisionParams } from '@/lib/validations/revisions';

/** One revision with its frozen design; a draft is "not found" for a client. */
export const GET = teamRoute(
  { params: RevisionParams, permission: 'project.view', teamOf: ({ revisionId }) => teamOfRevision(revisionId) },
  async ({ params, role }) => ({ revision: await getRevision(params.revisionId, role) }),
);
