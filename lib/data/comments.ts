import 'server-only';
import { Op } from 'sequelize';
import { models } from '../../models';
import { teamOfProjectRow } from './projects';
import type { Comment } from '../../models/comment';
import { recordActivity } from '../activity/record';
import type { SessionUser } from '../auth/users';
import { AppError, forbidden, notFound, notInProject } from '../errors';
import { can } from '../permissions';
import { isRouteAnchor, type CommentAnchor } from '../review/anchors';
import type { AnchorNow, CommentRecord } from '../review/comment-types';
import type { DesignSnapshot } from '../review/snapshot-types';
import { CLIENT_VISIBLE_STATUSES } from '../review/statuses';
import type { Role } from '../roles';
import type { CreateCommentInput } from '../validations/comments';
import { listMembers } from './teams';

interface WorkingCopyIndex {
  lines: Map<string, { name: string; fromM: number; toM: number }>;
  routes: Map<string, { name: string; lengthM: number }>;
  networkParts: Map<string, { name: string; part: 'node' | 'link' }>;
}

async function workingCopyIndex(projectId: string): Promise<WorkingCopyIndex> {
  const { Line, Route, NetworkNode, NetworkLink } = models();
  const routes = await Route.findAll({ where: { projectId }, attributes: ['id', 'name', 'lengthM'] });
  const nodes = await NetworkNode.findAll({ where: { projectId }, attributes: ['id', 'name'] });
  const links = await NetworkLink.findAll({ where: { projectId }, attributes: ['id', 'name'] });
  const routeMap = new Map(routes.map((r) => [r.id, { name: r.name, lengthM: r.lengthM ?? 0 }]));
  const lines = await Line.findAll({
    where: { projectId },
    attributes: ['id', 'name', 'routeId', 'fromChainageM', 'toChainageM'],
  });
  return {
    routes: routeMap,
    networkParts: new Map<string, { name: string; part: 'node' | 'link' }>([
      ...nodes.map((n): [string, { name: string; part: 'node' }] => [n.id, { name: n.name, part: 'node' }]),
      ...links.map((l): [string, { name: string; part: 'link' }] => [l.id, { name: l.name, part: 'link' }]),
    ]),
    lines: new Map(
      lines.map((l) => [
        l.id,
        {
          name: l.name,
          fromM: l.fromChainageM ?? 0,
          toM: l.toChainageM ?? (l.routeId ? (routeMap.get(l.routeId)?.lengthM ?? Infinity) : Infinity),
        },
      ]),
    ),
  };
}

/** Where an anchor lies in the working copy now: still there, or gone (and why). */
export function anchorNow(anchor: CommentAnchor, index: WorkingCopyIndex): AnchorNow {
  const EPS = 1e-6;
  switch (anchor.kind) {
    case 'project':
      return { state: 'present', words: 'the whole project' };
    case 'line-chainage':
    case 'warning': {
      const line = index.lines.get(anchor.lineId);
      if (!line) return { state: 'gone', words: 'the line is no longer in the working copy' };
      if (anchor.chainageM < line.fromM - EPS || anchor.chainageM > line.toM + EPS)
        return { state: 'gone', words: `the chainage is now outside line "${line.name}"` };
      return { state: 'present', words: `on line "${line.name}"` };
    }
    case 'route-chainage': {
      const route = index.routes.get(anchor.routeId);
      if (!route) return { state: 'gone', words: 'the route is no longer in the project' };
      if (anchor.chainageM > route.lengthM + EPS)
        return { state: 'gone', words: `the chainage is now past the end of route "${route.name}"` };
      return { state: 'present', words: `on route "${route.name}"` };
    }
    case 'network': {
      const part = index.networkParts.get(anchor.partId);
      if (!part || part.part !== anchor.part)
        return { state: 'gone', words: `the network ${anchor.part} is no longer in the working copy` };
      return { state: 'present', words: `network ${anchor.part} "${part.name}"` };
    }
  }
}

export async function teamOfComment(commentId: string): Promise<string | null> {
  return teamOfProjectRow('comments', commentId);
}

/**
 * The project's comments (threads in order) that the caller may read: a client reads those on approved and issued
 * revisions only.
 */
export async function listComments(projectId: string, role: Role): Promise<CommentRecord[]> {
  const { Comment: C, Revision, User } = models();
  const revisions = await Revision.findAll({ where: { projectId }, attributes: ['id', 'number', 'status'] });
  const visible = can(role, 'design.view')
    ? revisions
    : revisions.filter((r) => CLIENT_VISIBLE_STATUSES.includes(r.status));
  const numbers = new Map(visible.map((r) => [r.id, r.number]));
  const where = can(role, 'design.view') ? { projectId } : { projectId, revisionId: { [Op.in]: [...numbers.keys()] } };
  const rows = await C.findAll({ where, order: [['createdAt', 'ASC']] });
  const ids = [
    ...new Set(rows.flatMap((r) => [r.authorId, r.resolvedBy, ...r.mentions]).filter((id): id is string => id != null)),
  ];
  const names = new Map(
    (ids.length ? await User.findAll({ where: { id: ids }, attributes: ['id', 'name'] }) : []).map((u) => [
      u.id,
      u.name,
    ]),
  );
  const person = (id: string | null) => (id ? { id, name: names.get(id) ?? 'a former member' } : null);
  const index = await workingCopyIndex(projectId);
  return rows.map((r: Comment) => ({
    id: r.id,
    projectId: r.projectId,
    revisionId: r.revisionId,
    revisionNumber: r.revisionId ? (numbers.get(r.revisionId) ?? null) : null,
    parentId: r.parentId,
    author: person(r.authorId),
    body: r.body,
    anchor: r.anchor,
    anchorNow: anchorNow(r.anchor, index),
    mentions: r.mentions.map((id) => person(id)!),
    resolved: r.resolvedAt != null,
    resolvedBy: person(r.resolvedBy),
    resolvedAt: r.resolvedAt?.toISOString() ?? null,
    createdAt: r.createdAt.toISOString(),
  }));
}

/** Surveyors comment on routes; owners, designers and reviewers anywhere. */
function assertMayComment(role: Role, anchor: CommentAnchor): void {
  if (can(role, 'review.comment')) return;
  if (can(role, 'comment.route') && isRouteAnchor(anchor)) return;
  throw forbidden('Your role may comment on survey routes only');
}

async function assertAnchorExists(
  projectId: string,
  anchor: CommentAnchor,
  snapshot: DesignSnapshot | null,
): Promise<void> {
  const { Line, Route } = models();
  if (anchor.kind === 'line-chainage' || anchor.kind === 'warning') {
    const there = snapshot
      ? snapshot.lines.some((l) => l.id === anchor.lineId)
      : (await Line.count({ where: { id: anchor.lineId, projectId } })) > 0;
    if (!there)
      throw notInProject(
        { 'anchor.lineId': ['Pick a line of this revision or working copy'] },
        'That line is not part of what you are commenting on',
      );
  }
  if (anchor.kind === 'network') {
    const parts = snapshot
      ? ((anchor.part === 'node' ? snapshot.network?.nodes : snapshot.network?.links) ?? [])
      : null;
    const where = { id: anchor.partId, projectId };
    const inWorkingCopy = async () =>
      (anchor.part === 'node'
        ? await models().NetworkNode.count({ where })
        : await models().NetworkLink.count({ where })) > 0;
    const there = parts ? parts.some((p) => p.id === anchor.partId) : await inWorkingCopy();
    if (!there)
      throw notInProject(
        { 'anchor.partId': [`Pick a ${anchor.part} of this revision or working copy`] },
        `That network ${anchor.part} is not part of what you are commenting on`,
      );
  }
  if (anchor.kind === 'route-chainage' && (await Route.count({ where: { id: anchor.routeId, projectId } })) === 0) {
    throw notInProject(
      { 'anchor.routeId': ['Pick a route of this project'] },
      'That route is not part of this project',
    );
  }
}

export async function createComment(
  projectId: string,
  user: SessionUser,
  role: Role,
  input: CreateCommentInput & { body: string },
): Promise<{ id: string }> {
  const { Comment: C, Revision, Membership, Project, sequelize } = models();
  return sequelize.transaction(async (transaction) => {
    let { revisionId, anchor } = {
      revisionId: input.revisionId ?? null,
      anchor: input.anchor ?? { kind: 'project' as const },
    };
    if (input.parentId) {
      const parent = await C.findOne({ where: { id: input.parentId, projectId }, transaction });
      if (!parent)
        throw notInProject(
          { parentId: ['Reply to a comment of this project'] },
          'The comment you reply to is not in this project',
        );
      if (parent.parentId)
        throw new AppError('bad_request', 'Reply to the first comment of the thread', {
          parentId: ['Reply to the thread, not to a reply'],
        });
      revisionId = parent.revisionId;
      anchor = parent.anchor;
    }
    assertMayComment(role, anchor);
    let snapshot: DesignSnapshot | null = null;
    let revisionNumber: number | null = null;
    if (revisionId) {
      const revision = await Revision.findOne({ where: { id: revisionId, projectId }, transaction });
      if (!revision)
        throw notInProject(
          { revisionId: ['Pick a revision of this project'] },
          'That revision is not part of this project',
        );
      snapshot = revision.snapshot as DesignSnapshot;
      revisionNumber = revision.number;
    }
    if (!input.parentId) await assertAnchorExists(projectId, anchor, snapshot);
    const mentions = [...new Set(input.mentions ?? [])];
    if (mentions.length) {
      const project = await Project.findByPk(projectId, { attributes: ['teamId'], transaction });
      const members = await Membership.count({ where: { teamId: project!.teamId, userId: mentions }, transaction });
      if (members !== mentions.length)
        throw notInProject(
          { mentions: ['Mention members of this team only'] },
          'Only members of this team can be mentioned',
        );
    }
    const row = await C.create(
      {
        projectId,
        revisionId,
        parentId: input.parentId ?? null,
        authorId: user.id,
        body: input.body,
        anchor,
        mentions,
      },
      { transaction },
    );
    await recordActivity(transaction, {
      projectId,
      actorUserId: user.id,
      kind: 'comment.added',
      subjectType: 'comment',
      subjectId: row.id,
      summary: `${user.name} ${input.parentId ? 'replied' : 'commented'} on ${revisionNumber ? `revision ${revisionNumber}` : 'the working copy'}: ${input.body.slice(0, 140)}`,
      data: { mentions, revisionNumber: revisionNumber ?? undefined, revisionId: revisionId ?? undefined, anchor },
    });
    return { id: row.id };
  });
}

export async function setCommentResolved(
  commentId: string,
  user: SessionUser,
  role: Role,
  resolved: boolean,
): Promise<{ id: string; resolved: boolean }> {
  const { Comment: C, sequelize } = models();
  return sequelize.transaction(async (transaction) => {
    const row = await C.findByPk(commentId, { transaction, lock: transaction.LOCK.UPDATE });
    if (!row) throw notFound();
    assertMayComment(role, row.anchor);
    if (row.parentId)
      throw new AppError('bad_request', 'Resolve the thread, not one reply', {
        resolved: ['Resolve the first comment of the thread'],
      });
    if ((row.resolvedAt != null) === resolved)
      throw new AppError('conflict', resolved ? 'This thread is already resolved' : 'This thread is already open');
    await row.update(
      resolved ? { resolvedAt: new Date(), resolvedBy: user.id } : { resolvedAt: null, resolvedBy: null },
      { transaction },
    );
    await recordActivity(transaction, {
      projectId: row.projectId,
      actorUserId: user.id,
      kind: resolved ? 'comment.resolved' : 'comment.reopened',
      subjectType: 'comment',
      subjectId: row.id,
      summary: `${user.name} ${resolved ? 'resolved' : 'reopened'} a comment: ${row.body.slice(0, 100)}`,
    });
    return { id: row.id, resolved };
  });
}

/** The people a member can mention in a comment: the rest of the team (none for someone who may not comment). */
export async function mentionableMembers(
  teamId: string,
  user: SessionUser,
  role: Role,
): Promise<{ id: string; name: string }[]> {
  if (!can(role, 'review.comment') && !can(role, 'comment.route')) return [];
  return (await listMembers(teamId, { userId: user.id, role }))
    .filter((m) => m.userId !== user.id)
    .map((m) => ({ id: m.userId, name: m.name }));
}
