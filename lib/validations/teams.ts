import { z } from 'zod';
import { ROLES } from '../roles';
import { email, nameText, uuid } from './common';

export const role = z.enum(ROLES, { error: `Role must be one of: ${ROLES.join(', ')}` });

export const TeamParams = z.strictObject({ teamId: uuid('Team id') });
export const MemberParams = z.strictObject({ teamId: uuid('Team id'), userId: uuid('User id') });

export const CreateTeamSchema = z.strictObject({ name: nameText('Team name') });
export const RenameTeamSchema = CreateTeamSchema;
export const AddMemberSchema = z.strictObject({ email, role });
export const ChangeRoleSchema = z.strictObject({ role });

export type AddMemberInput = z.infer<typeof AddMemberSchema>;
export type ChangeRoleInput = z.infer<typeof ChangeRoleSchema>;
