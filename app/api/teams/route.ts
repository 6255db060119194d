import { userRoute } from '@/lib/api/route';
import { createTeam, listTeamsOf } from '@/lib/data/teams';
import { CreateTeamSchema } from '@/lib/validations/teams';

export const GET = userRoute({}, async ({ user }) => ({ teams: await listTeamsOf(user.id) }));

export const POST = userRoute({ body: CreateTeamSchema, status: 201 }, async ({ user, body }) => ({
  team: await createTeam(user.id, body.name),
}));
