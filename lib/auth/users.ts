import { models } from '../../models';
import type { SignUpInput } from '../validations/auth';
import { AppError } from '../errors';
import { hashPassword } from './password';

export interface SessionUser {
  id: string;
  email: string;
  name: string;
  sessionVersion: number;
}

/** Creates an account and its own team (the new user is its owner), in one transaction. */
export async function createAccount(input: SignUpInput): Promise<SessionUser> {
  const { User, Team, Membership, sequelize } = models();
  const passwordHash = await hashPassword(input.password);
  return sequelize.transaction(async (transaction) => {
    const taken = await User.findOne({ where: { email: input.email }, transaction });
    if (taken) throw new AppError('conflict', 'An account with this e-mail already exists', { email: ['This e-mail is already registered'] });
    const user = await User.create({ email: input.email, name: input.name, passwordHash }, { transaction });
    const team = await Team.create({ name: `${input.name}'s team` }, { transaction });
    await Membership.create({ teamId: team.id, userId: user.id, role: 'owner' }, { transaction });
    return { id: user.id, email: user.email, name: user.name, sessionVersion: user.sessionVersion };
  });
}

/** Ends every session of the user: tokens carry the version they were issued with. */
export async function bumpSessionVersion(userId: string): Promise<void> {
  const { User } = models();
  await User.increment('sessionVersion', { where: { id: userId } });
}
