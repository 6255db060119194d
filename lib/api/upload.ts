import type { NextRequest } from 'next/server';
import { AppError } from '../errors';
import { readBodyCapped } from './body';

/** Room for the form's own bytes (boundaries, headers, the options field) around the file. */
const FORM_OVERHEAD_BYTES = 1024 * 1024;

export interface UploadedFile {
  fileName: string;
  contentType: string;
  bytes: Uint8Array;
  /** The form's other text fields by name. */
  fields: Record<string, string>;
}

const mb = (n: number) => `${(n / (1024 * 1024)).toFixed(1)} MB`;

function tooLarge(bytes: number | null, maxFileBytes: number, what = 'a survey file'): AppError {
  const size = bytes === null ? 'larger than the limit' : mb(bytes);
  const message = `The upload is ${size}; ${what} may be at most ${mb(maxFileBytes)}`;
  return new AppError('payload_too_large', message, { file: [message] });
}

/**
 * Reads a multipart/form-data upload with one file field. Size is checked from the declared
 * length first (413 before reading), then while streaming, then on the file itself.
 */
export async function readFileUpload(
  req: NextRequest,
  options: {
    fileField: string;
    maxFileBytes: number;
    /** How the size refusal names the file. @default 'a survey file' */ what?: string;
  },
): Promise<UploadedFile> {
  const type = req.headers.get('content-type') ?? '';
  if (!/^multipart\/form-data;\s*boundary=/i.test(type)) {
    throw new AppError(
      'unsupported_media_type',
      `Send the file as multipart/form-data with a “${options.fileField}” field`,
      {
        [options.fileField]: ['Choose a file to upload'],
      },
    );
  }
  const limit = options.maxFileBytes + FORM_OVERHEAD_BYTES;
  const declared = Number(req.headers.get('content-length') ?? '0');
  const body = await readBodyCapped(req, limit, () =>
    tooLarge(declared > limit ? declared : null, options.maxFileBytes),
  );
  let form: FormData;
  try {
    form = await new Request('http://upload.local/', {
      method: 'POST',
      headers: { 'content-type': type },
      body: body as BodyInit,
    }).formData();
  } catch {
    throw new AppError('bad_request', 'The upload could not be read as a form; send it again', {
      [options.fileField]: ['The upload was incomplete or malformed'],
    });
  }
  // One file per upload: a second part of the same name would be silently dropped, so it is refused.
  if (form.getAll(options.fileField).length > 1) {
    throw new AppError('bad_request', `Send one file in the “${options.fileField}” field, not several`, {
      [options.fileField]: ['Send one file at a time'],
    });
  }
  const file = form.get(options.fileField);
  if (!(file instanceof File)) {
    throw new AppError('bad_request', `No file was sent in the “${options.fileField}” field`, {
      [options.fileField]: ['Choose a file to upload'],
    });
  }
  if (file.size > options.maxFileBytes) throw tooLarge(file.size, options.maxFileBytes, options.what);
  const fields: Record<string, string> = {};
  form.forEach((value, key) => {
    if (typeof value === 'string') fields[key] = value;
  });
  return {
    fileName: file.name || 'upload',
    contentType: file.type || 'application/octet-stream',
    bytes: new Uint8Array(await file.arrayBuffer()),
    fields,
  };
}
