import 'server-only';
import { Op, type Transaction } from 'sequelize';
import { models } from '../../models';
import { teamOfProjectRow } from './projects';
import type { Revision } from '../../models/revision';
import { recordActivity } from '../activity/record';
import type { SessionUser } from '../auth/users';
import { AppError, forbidden, notFound } from '../errors';
import { can } from '../permissions';
import type { RevisionRecord, RevisionSummary } from '../review/revision-types';
import type { DesignSnapshot } from '../review/snapshot-types';
import { CLIENT_VISIBLE_STATUSES, REVISION_STATUS_LABELS, type RevisionStatus } from '../review/statuses';
import { TRANSITIONS, type RevisionAction } from '../review/transitions';
import type { Role } from '../roles';
import { compareSnapshots } from '../review/compare';
import { takeDesignSnapshot } from './design-snapshot';

async function peopleByIds(ids: (string | null)[], transaction?: Transaction): Promise<Map<string, string>> {
  const wanted = [...new Set(ids.filter((id): id is string => id != null))];
  if (wanted.length === 0) return new Map();
  const users = await models().User.findAll({ attributes: ['id', 'name'], where: { id: wanted }, transaction });
  return new Map(users.map((u) => [u.id, u.name]));
}

const person = (id: string | null, names: Map<string, string>) =>
  id ? { id, name: names.get(id) ?? 'a former member' } : null;

function summaryOf(row: Revision, names: Map<string, string>): RevisionSummary {
  const snapshot = row.snapshot as DesignSnapshot;
  return {
    id: row.id,
    projectId: row.projectId,
    number: row.number,
    status: row.status,
    note: row.note,
    createdBy: person(row.createdBy, names),
    submittedAt: row.submittedAt?.toISOString() ?? null,
    reviewedBy: person(row.reviewedBy, names),
    reviewedAt: row.reviewedAt?.toISOString() ?? null,
    issuedAt: row.issuedAt?.toISOString() ?? null,
    createdAt: row.createdAt.toISOString(),
    lines: snapshot.lines.map((l) => ({ id: l.id, name: l.name })),
  };
}

/** A client (viewer) sees approved and issued revisions only; the rest of the team sees every one. */
function visibleWhere(role: Role) {
  return can(role, 'design.view') ? {} : { status: { [Op.in]: [...CLIENT_VISIBLE_STATUSES] } };
}

export async function teamOfRevision(revisionId: string): Promise<string | null> {
  return teamOfProjectRow('revisions', revisionId);
}

export async function listRevisions(projectId: string, role: Role): Promise<RevisionSummary[]> {
  const rows = await models().Revision.findAll({
    where: { projectId, ...visibleWhere(role) },
    order: [['number', 'DESC']],
  });
  const names = await peopleByIds(rows.flatMap((r) => [r.createdBy, r.reviewedBy]));
  return rows.map((r) => summaryOf(r, names));
}

/** One revision with its snapshot; a revision the caller may not see is "not found". */
export async function getRevision(revisionId: string, role: Role): Promise<RevisionRecord> {
  const row = await models().Revision.findOne({ where: { id: revisionId, ...visibleWhere(role) } });
  if (!row) throw notFound();
  const names = await peopleByIds([row.createdBy, row.reviewedBy]);
  return { ...summaryOf(row, names), snapshot: row.snapshot as DesignSnapshot };
}

/** Freezes the project's design as the next numbered revision (a draft, or submitted at once). */
export async function createRevision(
  projectId: string,
  user: SessionUser,
  input: { note: string; submit: boolean },
): Promise<RevisionSummary> {
  const { Revision: R, Project, sequelize } = models();
  return sequelize.transaction(async (transaction) => {
    // Numbers come from a locked project row, so two designers issuing at once get 4 and 5, never two 4s.
    await Project.findByPk(projectId, { transaction, lock: transaction.LOCK.UPDATE, attributes: ['id'] });
    const last = (await R.max('number', { where: { projectId }, transaction })) as number | null;
    const now = new Date();
    const snapshot = await takeDesignSnapshot(projectId, transaction);
    const row = await R.create(
      {
        projectId,
        number: (last ?? 0) + 1,
        status: input.submit ? 'submitted' : 'draft',
        note: input.note,
        snapshot,
        createdBy: user.id,
        ...(input.submit ? { submittedBy: user.id, submittedAt: now } : {}),
      },
      { transaction },
    );
    await recordActivity(transaction, {
      projectId,
      actorUserId: user.id,
      kind: 'revision.created',
      subjectType: 'revision',
      subjectId: row.id,
      summary: `${user.name} made revision ${row.number}${input.note ? `: ${input.note}` : ''}`,
      data: { revisionNumber: row.number },
    });
    if (input.submit) {
      await recordActivity(transaction, {
        projectId,
        actorUserId: user.id,
        kind: 'revision.submitted',
        subjectType: 'revision',
        subjectId: row.id,
        summary: `${user.name} submitted revision ${row.number} for review`,
        data: { revisionNumber: row.number },
      });
    }
    return summaryOf(row, new Map([[user.id, user.name]]));
  });
}

/**
 * Moves a revision one step through the review cycle. The row is locked and its current status
 * checked inside the transaction, so of two reviewers racing one succeeds and the other gets 409.
 */
export async function transitionRevision(
  revisionId: string,
  user: SessionUser,
  role: Role,
  action: RevisionAction,
  note: string,
): Promise<RevisionSummary> {
  const rule = TRANSITIONS[action];
  if (!can(role, rule.permission)) throw forbidden();
  const { Revision: R, sequelize } = models();
  return sequelize.transaction(async (transaction) => {
    const row = await R.findByPk(revisionId, { transaction, lock: transaction.LOCK.UPDATE });
    if (!row) throw notFound();
    if (rule.notByAuthor && row.createdBy === user.id) {
      throw new AppError('forbidden', `You made revision ${row.number}; someone else must review it`);
    }
    if (!rule.from.includes(row.status as RevisionStatus)) {
      throw new AppError(
        'conflict',
        `Revision ${row.number} is ${REVISION_STATUS_LABELS[row.status as RevisionStatus].toLowerCase()} now, so it cannot be ${rule.verb}; reload to see why`,
      );
    }
    const now = new Date();
    row.status = rule.to;
    if (action === 'submit') Object.assign(row, { submittedBy: user.id, submittedAt: now });
    if (action === 'approve' || action === 'request-changes')
      Object.assign(row, { reviewedBy: user.id, reviewedAt: now });
    if (action === 'issue') {
      Object.assign(row, { issuedBy: user.id, issuedAt: now });
      const earlier = await R.findAll({
        where: { projectId: row.projectId, status: 'issued', id: { [Op.ne]: row.id } },
        transaction,
        lock: transaction.LOCK.UPDATE,
      });
      for (const old of earlier) {
        await old.update({ status: 'superseded' }, { transaction });
        await recordActivity(transaction, {
          projectId: row.projectId,
          actorUserId: user.id,
          kind: 'revision.superseded',
          subjectType: 'revision',
          subjectId: old.id,
          summary: `Revision ${old.number} was superseded by revision ${row.number}`,
          data: { revisionNumber: old.number, by: row.number },
        });
      }
    }
    await row.save({ transaction });
    await recordActivity(transaction, {
      projectId: row.projectId,
      actorUserId: user.id,
      kind: rule.activity,
      subjectType: 'revision',
      subjectId: row.id,
      summary: `${user.name} ${rule.verb} revision ${row.number}${note ? `: ${note}` : ''}`,
      data: { revisionNumber: row.number, authorUserId: row.createdBy, note },
    });
    const names = await peopleByIds([row.createdBy, row.reviewedBy], transaction);
    return summaryOf(row, names);
  });
}

/** Two revisions of one project (earlier first) and what changed between them. */
export async function compareRevisions(revisionId: string, otherId: string, role: Role) {
  const [a, b] = await Promise.all([getRevision(revisionId, role), getRevision(otherId, role)]);
  if (a.projectId !== b.projectId) throw notFound();
  const [before, after] = a.number < b.number ? [a, b] : [b, a];
  const summary = (r: RevisionRecord): RevisionSummary => {
    const copy: Partial<RevisionRecord> = { ...r };
    delete copy.snapshot;
    return copy as RevisionSummary;
  };
  return {
    before: summary(before),
    after: summary(after),
    comparison: compareSnapshots(before.snapshot, after.snapshot),
  };
}
