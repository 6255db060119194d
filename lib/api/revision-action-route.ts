import 'server-only';
import { teamOfRevision, transitionRevision } from '../data/revisions';
import { TRANSITIONS, type RevisionAction } from '../review/transitions';
import { RevisionActionSchema, RevisionParams } from '../validations/revisions';
import { teamRoute } from './route';

/** The handler of one review step; its permission comes from the one transition table. */
export function revisionActionRoute(action: RevisionAction) {
  return teamRoute(
    {
      params: RevisionParams,
      body: RevisionActionSchema,
      permission: TRANSITIONS[action].permission,
      teamOf: ({ revisionId }) => teamOfRevision(revisionId),
    },
    async ({ params, body, user, role }) => ({
      revision: await transitionRevision(params.revisionId, user, role, action, body?.note ?? ''),
    }),
  );
}
