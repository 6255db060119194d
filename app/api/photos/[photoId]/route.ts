import { teamRoute } from '@/lib/api/route';
import { deletePhoto, teamOfPhoto, unitSystemOfPhoto, updatePhoto } from '@/lib/data/photos';
import { PHOTO_WORDS } from '@/lib/validations/field-word-tables';
import { PhotoParams, PhotoUpdateSchema } from '@/lib/validations/photos';

const teamOf = ({ photoId }: { photoId: string }) => teamOfPhoto(photoId);

export const PATCH = teamRoute(
  {
    params: PhotoParams,
    body: PhotoUpdateSchema,
    bodyWords: { table: PHOTO_WORDS, unitsOf: ({ photoId }) => unitSystemOfPhoto(photoId) },
    permission: 'survey.edit',
    teamOf,
  },
  async ({ params, body }) => ({
    photo: await updatePhoto(params.photoId, body),
  }),
);

export const DELETE = teamRoute({ params: PhotoParams, permission: 'survey.edit', teamOf }, async ({ params }) => {
  await deletePhoto(params.photoId);
});
