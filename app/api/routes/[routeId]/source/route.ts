import { teamRoute } from '@/lib/api/route';
import { sourceFileOf, teamOfRoute } from '@/lib/data/routes';
import { notFound } from '@/lib/errors';
import { getObject } from '@/lib/storage';
import { RouteParams } from '@/lib/validations/routes';

const teamOf = ({ routeId }: { routeId: string }) => teamOfRoute(routeId);

/** The original uploaded survey file, byte for byte. */
export const GET = teamRoute({ params: RouteParams, permission: 'design.view', teamOf }, async ({ params }) => {
  const file = await sourceFileOf(params.routeId);
  if (!file) throw notFound('This route has no uploaded file (it was sketched, typed or made by an edit)');
  const stored = await getObject(file.storageKey);
  if (!stored) throw notFound('The stored file is missing from object storage');
  const asciiName = file.fileName.replace(/[^\x20-\x7e]/g, '_').replace(/["\\]/g, '_');
  return new Response(stored.bytes as BodyInit, {
    status: 200,
    headers: {
      'content-type': file.contentType,
      'content-length': String(stored.bytes.byteLength),
      'content-disposition': `attachment; filename="${asciiName}"; filename*=UTF-8''${encodeURIComponent(file.fileName)}`,
      'cache-control': 'private, no-store',
      'x-content-type-options': 'nosniff',
    },
  });
});
