import { teamRoute } from '@/lib/api/route';
import { compareRevisions, teamOfRevision } from '@/lib/data/revisions';
import { AppError } from '@/lib/errors';
import { RevisionPairParams } from '@/lib/validations/revisions';

/** What changed between two revisions of one project, earlier first whatever the order asked. */
export const GET = teamRoute(
  {
    params: RevisionPairParams,
    permission: 'project.view',
    teamOf: async ({ revisionId, otherId }) => {
      const [a, b] = await Promise.all([teamOfRevision(revisionId), teamOfRevision(otherId)]);
      return a && a === b ? a : null;
    },
  },
  async ({ params, role }) => {
    if (params.revisionId === params.otherId)
      throw new AppError('bad_request', 'Pick two different revisions to compare', {
        otherId: ['Pick another revision'],
      });
    return compareRevisions(params.revisionId, params.otherId, role);
  },
);
