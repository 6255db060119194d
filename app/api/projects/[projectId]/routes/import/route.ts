import { teamRoute } from '@/lib/api/route';
import { parseOrThrow } from '@/lib/api/body';
import { readFileUpload } from '@/lib/api/upload';
import { AppError } from '@/lib/errors';
import { teamOfProject, unitSystemOfProject } from '@/lib/data/projects';
import { importSurvey } from '@/lib/data/route-import';
import { warmRouteView } from '@/lib/data/routes';
import { MAX_SURVEY_FILE_BYTES } from '@/lib/survey/sniff';
import { ProjectParams } from '@/lib/validations/projects';
import { surveyImportWords } from '@/lib/validations/field-word-tables';
import { fieldErrorsIn } from '@/lib/validations/field-words';
import { SurveyImportOptionsSchema } from '@/lib/validations/survey-import';

const teamOf = ({ projectId }: { projectId: string }) => teamOfProject(projectId);

function readOptions(raw: string | undefined): unknown {
  if (raw === undefined)
    throw new AppError('bad_request', 'The import options are missing', {
      options: ['Send the import options as JSON'],
    });
  try {
    return JSON.parse(raw);
  } catch {
    throw new AppError('bad_request', 'The import options are not valid JSON', {
      options: ['Send the import options as JSON'],
    });
  }
}

/**
 * Uploads a survey file and imports it as a new route, all or nothing. multipart/form-data with
 * `file` (the survey file, ≤ 50 MB) and `options` (JSON, see lib/validations/survey-import.ts).
 */
export const POST = teamRoute(
  { params: ProjectParams, permission: 'survey.edit', teamOf, status: 201 },
  async ({ req, params, user }) => {
    const upload = await readFileUpload(req, { fileField: 'file', maxFileBytes: MAX_SURVEY_FILE_BYTES });
    const raw = readOptions(upload.fields.options);
    const system = await unitSystemOfProject(params.projectId);
    const options = parseOrThrow(SurveyImportOptionsSchema, raw, 'Some import options are not valid', (error) =>
      fieldErrorsIn(error, system, surveyImportWords(raw)),
    );
    const imported = await importSurvey({
      projectId: params.projectId,
      userId: user.id,
      fileName: upload.fileName,
      contentType: upload.contentType,
      bytes: upload.bytes,
      options,
    });
    // The browser goes to the route's page next: its view is worked out meanwhile (not awaited).
    warmRouteView(imported.route.id);
    return imported;
  },
);
