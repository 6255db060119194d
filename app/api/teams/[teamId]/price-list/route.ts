import { teamRoute } from '@/lib/api/route';
import { readPriceList, replacePriceList } from '@/lib/data/price-list';
import { teamOfTeamPath } from '@/lib/data/teams';
import { PriceListSchema } from '@/lib/validations/network';
import { TeamParams } from '@/lib/validations/teams';

const teamOf = teamOfTeamPath;

export const GET = teamRoute({ params: TeamParams, permission: 'team.view', teamOf }, async ({ teamId }) => ({
  items: await readPriceList(teamId),
}));

/** The whole list is replaced at once, so a pipe priced twice is caught together with the rest. */
export const PUT = teamRoute(
  { params: TeamParams, body: PriceListSchema, permission: 'design.edit', teamOf },
  async ({ teamId, body }) => ({ items: await replacePriceList(teamId, body) }),
);
