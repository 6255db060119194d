import 'server-only';
import type { Transaction } from 'sequelize';
import { Op } from 'sequelize';
import { models } from '../../models';
import { appLink } from '../mail/links';
import { queueMail } from '../mail/outbox';
import { can, type Permission } from '../permissions';
import type { Role } from '../roles';
import type { NotificationKind } from './kinds';
import { optedOut } from './preferences';

export interface NotificationEvent {
  kind: NotificationKind;
  /** The team the event happened on: only its members are told. */
  teamId: string;
  /** Who did it; never told of their own act. */
  actorId: string | null;
  /** Who should hear; when absent, the team members whose role holds the kind's permission. */
  recipientIds?: string[];
  /** One line that says what happened, e.g. "Tobias Wren submitted revision 3 of Spring line for review". */
  summary: string;
  /** Path in the app the message links to. */
  path: string;
  /** More words (a comment's text), quoted under the summary. */
  detail?: string;
}

/** Who hears of a kind when the event names no one: a submitted revision goes to those who may review. */
const DEFAULT_AUDIENCE: Partial<Record<NotificationKind, Permission>> = {
  'revision-submitted': 'review.comment',
};

async function audience(
  transaction: Transaction,
  event: NotificationEvent,
): Promise<{ id: string; email: string; name: string }[]> {
  const { Membership, User } = models();
  const permission = DEFAULT_AUDIENCE[event.kind];
  if (!event.recipientIds && !permission) return [];
  const memberships = await Membership.findAll({
    where: { teamId: event.teamId, ...(event.recipientIds ? { userId: { [Op.in]: event.recipientIds } } : {}) },
    include: [{ model: User, as: 'user', attributes: ['id', 'email', 'name'] }],
    transaction,
  });
  return memberships
    .filter((m) => event.recipientIds || can(m.role as Role, permission!))
    .map((m) => (m as unknown as { user: { id: string; email: string; name: string } }).user)
    .filter((u) => u.id !== event.actorId);
}

/**
 * Queues one mail per person who should hear of the event and has not turned its kind off, in
 * the caller's transaction: the notification exists exactly when the change it announces does.
 */
export async function enqueueNotification(transaction: Transaction, event: NotificationEvent): Promise<number> {
  const people = await audience(transaction, event);
  const off = await optedOut(
    transaction,
    people.map((p) => p.id),
    event.kind,
  );
  const settings = appLink('/account');
  let queued = 0;
  for (const person of people) {
    if (off.has(person.id)) continue;
    const quote = event.detail ? `\n\n> ${event.detail.replace(/\n/g, '\n> ')}` : '';
    await queueMail(transaction, {
      kind: event.kind,
      to: person.email,
      subject: event.summary.length > 200 ? `${event.summary.slice(0, 197)}…` : event.summary,
      text: `Hello ${person.name},\n\n${event.summary}.${quote}\n\nOpen it: ${appLink(event.path)}\n\n— Runnel\nChoose which notifications you get: ${settings}`,
    });
    queued += 1;
  }
  return queued;
}
