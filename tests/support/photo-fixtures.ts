import './env';
import sharp from 'sharp';
import { uploadPhoto } from '@/lib/data/photos';
import { multipartBody } from './multipart';

/** Degrees → the EXIF "d/1 m/1 s/100" rational triple sharp writes into the GPS block. */
function dms(deg: number): string {
  const a = Math.abs(deg);
  const d = Math.floor(a);
  const m = Math.floor((a - d) * 60);
  const s = Math.round(((a - d) * 60 - m) * 60 * 10000);
  return `${d}/1 ${m}/1 ${s}/10000`;
}

/** A small JPEG made here, with position, time and a camera owner's name in its metadata. */
export async function jpegWithPosition(latitudeDeg: number, longitudeDeg: number, takenAt = '2026:04:12 09:30:00'): Promise<Uint8Array> {
  const bytes = await sharp({ create: { width: 96, height: 64, channels: 3, background: '#5b8a72' } })
    .jpeg()
    .withExif({
      IFD0: { Make: 'Fieldcam', Artist: 'Private Camera Owner' },
      IFD2: { DateTimeOriginal: takenAt },
      IFD3: { GPSLatitudeRef: latitudeDeg >= 0 ? 'N' : 'S', GPSLatitude: dms(latitudeDeg), GPSLongitudeRef: longitudeDeg >= 0 ? 'E' : 'W', GPSLongitude: dms(longitudeDeg) },
    })
    .toBuffer();
  return new Uint8Array(bytes);
}

/** A small PNG with no metadata (a screenshot of a sketch, say). */
export const PLAIN_PNG = new Uint8Array(await sharp({ create: { width: 40, height: 30, channels: 3, background: '#c8a165' } }).png().toBuffer());

export function photoUpload(bytes: Uint8Array, fileName: string, fields: Record<string, string> = {}, contentType = 'image/jpeg') {
  return multipartBody([{ name: 'file', value: bytes, fileName, contentType }, ...Object.entries(fields).map(([name, value]) => ({ name, value }))]);
}

export async function createPhotoFixture(projectId: string, userId: string): Promise<string> {
  return (await uploadPhoto({ projectId, userId, fileName: 'sketch.png', bytes: PLAIN_PNG, caption: 'Trough inlet' })).id;
}
