import type { ActivityKind } from '../activity/kinds';
import type { Permission } from '../permissions';
import type { RevisionStatus } from './statuses';

export type RevisionAction = 'submit' | 'request-changes' | 'approve' | 'issue';

export interface TransitionRule {
  from: readonly RevisionStatus[];
  to: RevisionStatus;
  permission: Permission;
  /** The author of the revision may not take this step (no self-approval). */
  notByAuthor: boolean;
  activity: ActivityKind;
  /** Button words and the feed's verb. */
  label: string;
  verb: string;
}

/**
 * The review cycle: draft -> submitted -> changes requested | approved -> issued (an earlier issued
 * revision becomes superseded). The one table the API, the data layer and the buttons read.
 */
export const TRANSITIONS: Record<RevisionAction, TransitionRule> = {
  submit: {
    from: ['draft'],
    to: 'submitted',
    permission: 'design.edit',
    notByAuthor: false,
    activity: 'revision.submitted',
    label: 'Submit for review',
    verb: 'submitted',
  },
  'request-changes': {
    from: ['submitted'],
    to: 'changes-requested',
    permission: 'review.decide',
    notByAuthor: true,
    activity: 'revision.changes-requested',
    label: 'Request changes',
    verb: 'sent back for changes',
  },
  approve: {
    from: ['submitted'],
    to: 'approved',
    permission: 'review.decide',
    notByAuthor: true,
    activity: 'revision.approved',
    label: 'Approve',
    verb: 'approved',
  },
  issue: {
    from: ['approved'],
    to: 'issued',
    permission: 'design.edit',
    notByAuthor: false,
    activity: 'revision.issued',
    label: 'Issue for building',
    verb: 'issued for building',
  },
};

export const REVISION_ACTIONS = Object.keys(TRANSITIONS) as RevisionAction[];
