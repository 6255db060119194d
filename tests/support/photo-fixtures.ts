import './env';
import sharp from 'sharp';
import { uploadPhoto } from '@/lib/data/photos';
import { multipartBody } from './multipart';

export { jpegWithPosition } from './photo-bytes';

/** A small PNG with no metadata (a screenshot of a sketch, say). */
export const PLAIN_PNG = new Uint8Array(
  await sharp({ create: { width: 40, height: 30, channels: 3, background: '#c8a165' } })
    .png()
    .toBuffer(),
);

export function photoUpload(
  bytes: Uint8Array,
  fileName: string,
  fields: Record<string, string> = {},
  contentType = 'image/jpeg',
) {
  return multipartBody([
    { name: 'file', value: bytes, fileName, contentType },
    ...Object.entries(fields).map(([name, value]) => ({ name, value })),
  ]);
}

export async function createPhotoFixture(projectId: string, userId: string): Promise<string> {
  return (await uploadPhoto({ projectId, userId, fileName: 'sketch.png', bytes: PLAIN_PNG, caption: 'Trough inlet' }))
    .id;
}
