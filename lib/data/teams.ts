import 'server-only';
import { Op } from 'sequelize';
import { models } from '../../models';
import { AppError } from '../errors';
import { can } from '../permissions';
import type { Role } from '../roles';

export interface TeamSummary {
  id: string;
  name: string;
  role: Role;
}
/** `email` is null where the caller may not see it (a client sees only their own). */
export interface MemberSummary {
  userId: string;
  name: string;
  email: string | null;
  role: Role;
  joinedAt: string;
}

export async function listTeamsOf(userId: string): Promise<TeamSummary[]> {
  const { Membership, Team } = models();
  const rows = await Membership.findAll({
    where: { userId },
    include: [{ model: Team, as: 'team' }],
    order: [['createdAt', 'ASC']],
  });
  return rows.map((m) => {
    const team = (m as unknown as { team: InstanceType<typeof Team> }).team;
    return { id: team.id, name: team.name, role: m.role };
  });
}

export async function createTeam(userId: string, name: string): Promise<TeamSummary> {
  const { Team, Membership, sequelize } = models();
  return sequelize.transaction(async (transaction) => {
    const team = await Team.create({ name }, { transaction });
    await Membership.create({ teamId: team.id, userId, role: 'owner' }, { transaction });
    return { id: team.id, name: team.name, role: 'owner' as const };
  });
}

export async function renameTeam(teamId: string, name: string): Promise<{ id: string; name: string }> {
  const { Team } = models();
  await Team.update({ name }, { where: { id: teamId } });
  return { id: teamId, name };
}

/**
 * The team of a team's own address (`/api/teams/[teamId]/...`), with no lookup: teamRoute's one
 * user-and-role query finds no membership for a team that does not exist (memberships reference
 * teams and are deleted with them), so a missing team is answered 404 exactly as a team the user is
 * not in, without a query of its own.
 */
export async function teamOfTeamPath({ teamId }: { teamId: string }): Promise<string> {
  return teamId;
}

export async function getTeam(teamId: string): Promise<{ id: string; name: string } | null> {
  const team = await models().Team.findByPk(teamId);
  return team ? { id: team.id, name: team.name } : null;
}

/** The team's members; `viewer` given without `members.contact` sees only their own e-mail address. */
export async function listMembers(teamId: string, viewer?: { userId: string; role: Role }): Promise<MemberSummary[]> {
  const showEmail = (userId: string) => !viewer || can(viewer.role, 'members.contact') || viewer.userId === userId;
  const { Membership, User } = models();
  const rows = await Membership.findAll({
    where: { teamId },
    include: [{ model: User, as: 'user' }],
    order: [['createdAt', 'ASC']],
  });
  return rows.map((m) => {
    const user = (m as unknown as { user: InstanceType<typeof User> }).user;
    return {
      userId: user.id,
      name: user.name,
      email: showEmail(user.id) ? user.email : null,
      role: m.role,
      joinedAt: m.createdAt.toISOString(),
    };
  });
}

async function assertAnotherOwnerRemains(teamId: string, userId: string, transaction: import('sequelize').Transaction) {
  const { Membership } = models();
  // Lock the team's owner rows so two owners cannot demote each other at the same moment.
  const owners = await Membership.findAll({
    where: { teamId, role: 'owner', userId: { [Op.ne]: userId } },
    transaction,
    lock: transaction.LOCK.UPDATE,
  });
  if (owners.length === 0)
    throw new AppError('conflict', 'A team needs at least one owner: make someone else owner first', {
      role: ['The last owner cannot be removed or demoted'],
    });
}

/**
 * Membership changes of one team run one after another (the team row is locked first): two owners
 * demoting each other at the same moment get one success and one 409, never a deadlock.
 */
async function lockTeam(teamId: string, transaction: import('sequelize').Transaction): Promise<void> {
  const team = await models().Team.findByPk(teamId, { transaction, lock: transaction.LOCK.UPDATE, attributes: ['id'] });
  if (!team) throw new AppError('not_found', 'Team not found');
}

export async function changeRole(teamId: string, userId: string, role: Role): Promise<MemberSummary> {
  const { Membership, User, sequelize } = models();
  return sequelize.transaction(async (transaction) => {
    await lockTeam(teamId, transaction);
    const m = await Membership.findOne({ where: { teamId, userId }, transaction, lock: transaction.LOCK.UPDATE });
    if (!m) throw new AppError('not_found', 'Not a member of this team');
    if (m.role === 'owner' && role !== 'owner') await assertAnotherOwnerRemains(teamId, userId, transaction);
    m.role = role;
    await m.save({ transaction });
    const user = await User.findByPk(userId, { transaction });
    return { userId, name: user!.name, email: user!.email, role, joinedAt: m.createdAt.toISOString() };
  });
}

export async function removeMember(teamId: string, userId: string): Promise<void> {
  const { Membership, sequelize } = models();
  await sequelize.transaction(async (transaction) => {
    await lockTeam(teamId, transaction);
    const m = await Membership.findOne({ where: { teamId, userId }, transaction, lock: transaction.LOCK.UPDATE });
    if (!m) throw new AppError('not_found', 'Not a member of this team');
    if (m.role === 'owner') await assertAnotherOwnerRemains(teamId, userId, transaction);
    await m.destroy({ transaction });
  });
}
