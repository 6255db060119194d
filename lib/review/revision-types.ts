import type { DesignSnapshot } from './snapshot-types';
import type { RevisionStatus } from './statuses';

/** A revision as lists show it (no snapshot). Names come from the users table, never from typed text. */
export interface RevisionSummary {
  id: string;
  projectId: string;
  number: number;
  status: RevisionStatus;
  note: string;
  createdBy: { id: string; name: string } | null;
  submittedAt: string | null;
  reviewedBy: { id: string; name: string } | null;
  reviewedAt: string | null;
  issuedAt: string | null;
  createdAt: string;
  lines: { id: string; name: string }[];
}

export interface RevisionRecord extends RevisionSummary {
  snapshot: DesignSnapshot;
}
