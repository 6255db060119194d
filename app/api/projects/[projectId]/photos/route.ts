import { parseOrThrow, parseQuery } from '@/lib/api/body';
import { teamRoute } from '@/lib/api/route';
import { readFileUpload } from '@/lib/api/upload';
import { env } from '@/lib/env';
import { listPhotos, uploadPhoto } from '@/lib/data/photos';
import { teamOfProject, unitSystemOfProject } from '@/lib/data/projects';
import { PHOTO_WORDS } from '@/lib/validations/field-word-tables';
import { fieldErrorsIn } from '@/lib/validations/field-words';
import { PhotoListQuery, PhotoUploadFieldsSchema } from '@/lib/validations/photos';
import { ProjectParams } from '@/lib/validations/projects';

const teamOf = ({ projectId }: { projectId: string }) => teamOfProject(projectId);

export const GET = teamRoute({ params: ProjectParams, permission: 'design.view', teamOf }, async ({ params, req }) => {
  const { routeId } = parseQuery(req, PhotoListQuery);
  return { photos: await listPhotos(params.projectId, routeId) };
});

/**
 * Uploads a site photo: multipart/form-data with `file` (JPEG or PNG) and optional `caption`,
 * `routeId` and `chainageM` (used when the photo carries no position).
 */
export const POST = teamRoute(
  { params: ProjectParams, permission: 'survey.edit', teamOf, status: 201 },
  async ({ req, params, user }) => {
    const upload = await readFileUpload(req, {
      fileField: 'file',
      maxFileBytes: env().RUNNEL_PHOTO_MAX_BYTES,
      what: 'a photo',
    });
    const system = await unitSystemOfProject(params.projectId);
    const fields = parseOrThrow(PhotoUploadFieldsSchema, upload.fields, 'Some photo details are not valid', (error) =>
      fieldErrorsIn(error, system, PHOTO_WORDS),
    );
    return {
      photo: await uploadPhoto({
        projectId: params.projectId,
        userId: user.id,
        fileName: upload.fileName,
        bytes: upload.bytes,
        ...fields,
      }),
    };
  },
);
