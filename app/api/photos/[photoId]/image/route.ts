import { parseQuery } from '@/lib/api/body';
import { teamRoute } from '@/lib/api/route';
import { photoRow, teamOfPhoto } from '@/lib/data/photos';
import { notFound } from '@/lib/errors';
import { getObject } from '@/lib/storage';
import { PhotoImageQuery, PhotoParams } from '@/lib/validations/photos';

const teamOf = ({ photoId }: { photoId: string }) => teamOfPhoto(photoId);

/** The stored image (`?size=thumbnail` for the small one): re-encoded on upload, so it carries no metadata. */
export const GET = teamRoute({ params: PhotoParams, permission: 'design.view', teamOf }, async ({ params, req }) => {
  const { size } = parseQuery(req, PhotoImageQuery, 'The image size is not valid');
  const photo = await photoRow(params.photoId);
  const stored = await getObject(size === 'thumbnail' ? photo.thumbnailKey : photo.imageKey);
  if (!stored) throw notFound('The image file is missing from storage');
  return new Response(stored.bytes as BodyInit, {
    headers: {
      'content-type': size === 'thumbnail' ? 'image/jpeg' : photo.contentType,
      'cache-control': 'private, max-age=3600',
      'x-content-type-options': 'nosniff',
    },
  });
});
