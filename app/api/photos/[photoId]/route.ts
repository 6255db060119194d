import { teamRoute } from '@/lib/api/route';
import { deletePhoto, teamOfPhoto, updatePhoto } from '@/lib/data/photos';
import { PhotoParams, PhotoUpdateSchema } from '@/lib/validations/photos';

const teamOf = ({ photoId }: { photoId: string }) => teamOfPhoto(photoId);

export const PATCH = teamRoute({ params: PhotoParams, body: PhotoUpdateSchema, permission: 'survey.edit', teamOf }, async ({ params, body }) => ({
  photo: await updatePhoto(params.photoId, body),
}));

export const DELETE = teamRoute({ params: PhotoParams, permission: 'survey.edit', teamOf }, async ({ params }) => {
  await deletePhoto(params.photoId);
});
