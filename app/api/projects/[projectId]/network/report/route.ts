import { teamRoute } from '@/lib/api/route';
import { networkReport } from '@/lib/data/network-report';
import { teamOfProject } from '@/lib/data/projects';
import { ProjectParams } from '@/lib/validations/projects';

const teamOf = ({ projectId }: { projectId: string }) => teamOfProject(projectId);

/**
 * The working copy's network as a PDF (schematic, heads and pressures, flows and velocities, sizes and cost), marked
 * not for construction.
 */
export const GET = teamRoute({ params: ProjectParams, permission: 'design.view', teamOf }, async ({ params, user }) => {
  const pdf = await networkReport(params.projectId, user.name ?? null);
  return new Response(new Uint8Array(pdf), {
    status: 200,
    headers: {
      'content-type': 'application/pdf',
      'content-disposition': 'attachment; filename="network-report.pdf"',
      'cache-control': 'no-store',
    },
  });
});
