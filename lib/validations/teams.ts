import { z } from 'zod';
import { ROLES } from '../roles';
import { email, nameText, uuid } from './common';

export const role = z.enum(ROLES, { error: `Role must be one of: ${ROLES.join(', ')}` });

export const TeamParams = z.strictObject({ teamId: uuid('Team id') });
export const MemberParams = z.strictObject({ teamId: uuid('Team id'), userId: uuid('User id') });

export const CreateTeamSchema = z.strictObject({ name: nameText('Team name') });
export const RenameTeamSchema = CreateTeamSchema;
/** An owner's invitation: the only way into a team. */
export const InviteMemberSchema = z.strictObject({ email, role });
export const InvitationParams = z.strictObject({ teamId: uuid('Team id'), invitationId: uuid('Invitation id') });
export const ChangeRoleSchema = z.strictObject({ role });

export type InviteMemberInput = z.infer<typeof InviteMemberSchema>;
export type ChangeRoleInput = z.infer<typeof ChangeRoleSchema>;
