'use server';

import { cookies } from 'next/headers';
import { z } from 'zod';
import { userAction } from '@/lib/api/action';
import { roleOnTeam } from '@/lib/api/membership';
import { TEAM_COOKIE } from '@/lib/current-team';
import { AppError } from '@/lib/errors';
import { uuid } from '@/lib/validations/common';

/** Switches the team the signed-in user works in; only a team they belong to. */
export const selectTeam = userAction(z.strictObject({ teamId: uuid('Team id') }), async ({ teamId }, user) => {
  if (!(await roleOnTeam(user.id, teamId))) throw new AppError('not_found', 'Team not found');
  (await cookies()).set(TEAM_COOKIE, teamId, { httpOnly: true, sameSite: 'lax', path: '/' });
  return { teamId };
});
