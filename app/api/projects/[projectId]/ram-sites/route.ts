import { RAM_SITE_WORDS } from '@/lib/validations/field-word-tables';
import { teamRoute } from '@/lib/api/route';
import { teamOfProject, inProjectUnits } from '@/lib/data/projects';
import { createRamSite, listRamSites } from '@/lib/data/ram-sites';
import { ProjectParams } from '@/lib/validations/projects';
import { RamSiteSchema } from '@/lib/validations/ram-sites';

const teamOf = ({ projectId }: { projectId: string }) => teamOfProject(projectId);

export const GET = teamRoute({ params: ProjectParams, permission: 'design.view', teamOf }, async ({ params }) => ({
  ramSites: await listRamSites(params.projectId),
}));

export const POST = teamRoute(
  {
    params: ProjectParams,
    body: RamSiteSchema,
    bodyWords: inProjectUnits(RAM_SITE_WORDS),
    permission: 'design.edit',
    teamOf,
    status: 201,
  },
  async ({ params, body, user }) => createRamSite(params.projectId, user.id, body),
);
