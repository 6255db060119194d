import 'server-only';
import { Op, type WhereOptions } from 'sequelize';
import { models } from '../../models';
import type { Activity } from '../../models/activity';
import type { ActivityKind } from '../activity/kinds';
import type { ActivityQuery } from '../validations/activity';

export interface ActivityRecord {
  id: string;
  kind: ActivityKind;
  actor: { id: string; name: string } | null;
  subjectType: string | null;
  subjectId: string | null;
  summary: string;
  data: Record<string, unknown>;
  createdAt: string;
}

const PAGE = 100;

/** The project's feed, newest first, a page at a time (the index on project and time keeps it linear in the page). */
export async function listActivity(
  projectId: string,
  query: ActivityQuery,
): Promise<{ items: ActivityRecord[]; nextBefore: string | null }> {
  const { Activity: A, User } = models();
  const where: WhereOptions<Activity> = {
    projectId,
    ...(query.kinds.length ? { kind: { [Op.in]: query.kinds } } : {}),
    ...(query.actor ? { actorUserId: query.actor } : {}),
    ...(query.before ? { createdAt: { [Op.lt]: new Date(query.before) } } : {}),
  };
  const rows = await A.findAll({ where, order: [['createdAt', 'DESC']], limit: PAGE + 1 });
  const page = rows.slice(0, PAGE);
  const ids = [...new Set(page.map((r) => r.actorUserId).filter((id): id is string => id != null))];
  const names = new Map(
    (ids.length ? await User.findAll({ where: { id: ids }, attributes: ['id', 'name'] }) : []).map((u) => [
      u.id,
      u.name,
    ]),
  );
  return {
    items: page.map((r) => ({
      id: r.id,
      kind: r.kind as ActivityKind,
      actor: r.actorUserId ? { id: r.actorUserId, name: names.get(r.actorUserId) ?? 'a former member' } : null,
      subjectType: r.subjectType,
      subjectId: r.subjectId,
      summary: r.summary,
      data: r.data,
      createdAt: r.createdAt.toISOString(),
    })),
    nextBefore: rows.length > PAGE ? page[page.length - 1].createdAt.toISOString() : null,
  };
}
