import { RAM_SITE_WORDS } from '@/lib/validations/field-word-tables';
import { teamRoute } from '@/lib/api/route';
import { teamOfProject, inProjectUnits } from '@/lib/data/projects';
import { deleteRamSite, updateRamSite } from '@/lib/data/ram-sites';
import { RamSiteParams } from '@/lib/validations/lift-common';
import { RamSiteSchema } from '@/lib/validations/ram-sites';

const teamOf = ({ projectId }: { projectId: string }) => teamOfProject(projectId);

/** Replaces the whole site: the form always sends every field, so lift and fall are checked together. */
export const PUT = teamRoute(
  {
    params: RamSiteParams,
    body: RamSiteSchema,
    bodyWords: inProjectUnits(RAM_SITE_WORDS),
    permission: 'design.edit',
    teamOf,
  },
  async ({ params, body }) => updateRamSite(params.projectId, params.siteId, body),
);

export const DELETE = teamRoute({ params: RamSiteParams, permission: 'design.edit', teamOf }, async ({ params }) => {
  await deleteRamSite(params.projectId, params.siteId);
});
