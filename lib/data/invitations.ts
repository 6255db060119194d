import 'server-only';
import { Op, type Transaction } from 'sequelize';
import { models } from '../../models';
import type { Invitation } from '../../models/invitation';
import type { SessionUser } from '../auth/users';
import { hashLinkToken, LINK_LIFETIME_MS, newLinkToken } from '../auth/tokens';
import { AppError } from '../errors';
import { invitationMail } from '../mail/messages';
import { queueMail } from '../mail/outbox';
import { enqueueNotification } from '../notifications/enqueue';
import { ROLE_LABELS, type Role } from '../roles';

export interface InvitationSummary {
  id: string;
  email: string;
  role: Role;
  invitedBy: string | null;
  expiresAt: string;
  expired: boolean;
}
export type InvitationState = 'open' | 'expired' | 'revoked' | 'used' | 'unknown';
export interface InvitationView {
  state: InvitationState;
  teamName: string | null;
  role: Role | null;
  email: string | null;
  inviterName: string | null;
}

const summary = (i: Invitation, inviter: string | null): InvitationSummary => ({
  id: i.id,
  email: i.email,
  role: i.role,
  invitedBy: inviter,
  expiresAt: i.expiresAt.toISOString(),
  expired: i.expiresAt.getTime() <= Date.now(),
});

function stateOf(i: Invitation | null): InvitationState {
  if (!i) return 'unknown';
  if (i.acceptedAt) return 'used';
  if (i.revokedAt) return 'revoked';
  if (i.expiresAt.getTime() <= Date.now()) return 'expired';
  return 'open';
}

export const INVITATION_REFUSALS: Record<Exclude<InvitationState, 'open'>, string> = {
  expired: 'This invitation has expired. Ask the team owner to invite you again.',
  revoked: 'This invitation was withdrawn by the team owner.',
  used: 'This invitation has already been used.',
  unknown: 'This invitation link is not valid. Check that the whole link was copied.',
};

/**
 * Invites an address to the team with a role and mails the link. An earlier open invitation of
 * the same address to the team is withdrawn, so only the newest link works. The answer does not
 * depend on whether the address has a Runnel account.
 */
export async function inviteToTeam(
  teamId: string,
  inviter: SessionUser,
  email: string,
  role: Role,
): Promise<InvitationSummary> {
  const { Invitation, Membership, Team, User, sequelize } = models();
  return sequelize.transaction(async (transaction) => {
    const member = await Membership.findOne({
      where: { teamId },
      include: [{ model: User, as: 'user', where: { email }, attributes: ['id'] }],
      transaction,
    });
    if (member)
      throw new AppError('conflict', 'Already a member of this team', {
        email: ['Already on the team; change their role in the list instead'],
      });
    const team = await Team.findByPk(teamId, { transaction });
    const now = new Date();
    await Invitation.update(
      { revokedAt: now },
      { where: { teamId, email, acceptedAt: { [Op.is]: null }, revokedAt: { [Op.is]: null } }, transaction },
    );
    const { token, hash } = newLinkToken();
    const invitation = await Invitation.create(
      {
        teamId,
        email,
        role,
        tokenHash: hash,
        invitedBy: inviter.id,
        expiresAt: new Date(now.getTime() + LINK_LIFETIME_MS.invitation),
      },
      { transaction },
    );
    await queueMail(transaction, invitationMail(email, team!.name, inviter.name, role, token));
    return summary(invitation, inviter.name);
  });
}

/** Invitations not yet accepted or withdrawn (expired ones too, so the owner can send them again). */
export async function listOpenInvitations(teamId: string): Promise<InvitationSummary[]> {
  const { Invitation, User } = models();
  const rows = await Invitation.findAll({
    where: { teamId, acceptedAt: { [Op.is]: null }, revokedAt: { [Op.is]: null } },
    order: [['createdAt', 'DESC']],
  });
  const inviters = await User.findAll({
    where: { id: rows.map((r) => r.invitedBy).filter((x): x is string => Boolean(x)) },
    attributes: ['id', 'name'],
  });
  const names = new Map(inviters.map((u) => [u.id, u.name]));
  return rows.map((r) => summary(r, r.invitedBy ? (names.get(r.invitedBy) ?? null) : null));
}

export async function revokeInvitation(teamId: string, invitationId: string): Promise<void> {
  const [count] = await models().Invitation.update(
    { revokedAt: new Date() },
    { where: { id: invitationId, teamId, acceptedAt: { [Op.is]: null }, revokedAt: { [Op.is]: null } } },
  );
  if (count === 0) throw new AppError('not_found', 'No open invitation with this id on the team');
}

/** What the invitation page shows for a link: whose team, which role, or why it cannot be used. */
export async function viewInvitation(token: string): Promise<InvitationView> {
  const { Invitation, Team, User } = models();
  const row = await Invitation.findOne({ where: { tokenHash: hashLinkToken(token) } });
  const state = stateOf(row);
  if (!row || state !== 'open') return { state, teamName: null, role: null, email: null, inviterName: null };
  const [team, inviter] = await Promise.all([
    Team.findByPk(row.teamId),
    row.invitedBy ? User.findByPk(row.invitedBy) : null,
  ]);
  return { state, teamName: team?.name ?? null, role: row.role, email: row.email, inviterName: inviter?.name ?? null };
}

async function claimInvitation(transaction: Transaction, token: string): Promise<Invitation> {
  const row = await models().Invitation.findOne({
    where: { tokenHash: hashLinkToken(token) },
    transaction,
    lock: transaction.LOCK.UPDATE,
  });
  const state = stateOf(row);
  if (state !== 'open')
    throw new AppError('bad_request', INVITATION_REFUSALS[state], { token: [INVITATION_REFUSALS[state]] });
  return row!;
}

export type Acceptance =
  { as: 'signed-in'; user: SessionUser } | { as: 'new-account'; name: string; passwordHash: string };

/**
 * Accepts an invitation, once: the signed-in person whose address it was sent to joins the team,
 * or a new account is made for that address (the link reached the mailbox, so the address is
 * proven). The inviter is told, in the same transaction.
 */
export async function acceptInvitation(
  token: string,
  acceptance: Acceptance,
): Promise<{ teamId: string; role: Role; email: string }> {
  const { Membership, User, Team, sequelize } = models();
  return sequelize.transaction(async (transaction) => {
    const invitation = await claimInvitation(transaction, token);
    const now = new Date();
    let user: InstanceType<typeof User>;
    if (acceptance.as === 'signed-in') {
      const found = await User.findByPk(acceptance.user.id, { transaction, lock: transaction.LOCK.UPDATE });
      if (!found || found.email !== invitation.email) {
        throw new AppError(
          'forbidden',
          `This invitation was sent to ${invitation.email}. Sign out, then open the link again and sign in with that address.`,
        );
      }
      user = found;
      user.emailVerifiedAt ??= now;
      await user.save({ transaction });
    } else {
      const taken = await User.findOne({ where: { email: invitation.email }, transaction });
      if (taken) {
        throw new AppError(
          'conflict',
          `${invitation.email} already has a Runnel account: sign in with it, then open this link again.`,
          { email: ['Sign in with this address instead'] },
        );
      }
      user = await User.create(
        { email: invitation.email, name: acceptance.name, passwordHash: acceptance.passwordHash, emailVerifiedAt: now },
        { transaction },
      );
    }
    const existing = await Membership.findOne({ where: { teamId: invitation.teamId, userId: user.id }, transaction });
    if (existing) throw new AppError('conflict', 'You are already on this team; the owner can change your role.');
    await Membership.create({ teamId: invitation.teamId, userId: user.id, role: invitation.role }, { transaction });
    invitation.acceptedAt = now;
    invitation.acceptedBy = user.id;
    await invitation.save({ transaction });
    const team = await Team.findByPk(invitation.teamId, { transaction });
    if (invitation.invitedBy) {
      await enqueueNotification(transaction, {
        kind: 'invitation-accepted',
        teamId: invitation.teamId,
        actorId: user.id,
        recipientIds: [invitation.invitedBy],
        summary: `${user.name} accepted your invitation and joined ${team?.name ?? 'the team'} as ${ROLE_LABELS[invitation.role]}`,
        path: '/team',
      });
    }
    return { teamId: invitation.teamId, role: invitation.role, email: user.email };
  });
}
