import 'server-only';
import exifr from 'exifr';
import sharp from 'sharp';
import { AppError } from '../errors';

export type PhotoType = 'image/jpeg' | 'image/png';

/** What the bytes are, from their first bytes (never from the name or the declared type). */
export function sniffPhotoType(bytes: Uint8Array): PhotoType | 'heic' | null {
  const starts = (sig: number[], at = 0) => sig.every((b, i) => bytes[at + i] === b);
  if (starts([0xff, 0xd8, 0xff])) return 'image/jpeg';
  if (starts([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a])) return 'image/png';
  // ISO base media "ftyp" box with a HEIF brand.
  const brand = String.fromCharCode(...bytes.slice(8, 12));
  if (starts([0x66, 0x74, 0x79, 0x70], 4) && ['heic', 'heix', 'hevc', 'heim', 'heis', 'mif1', 'msf1'].includes(brand)) return 'heic';
  return null;
}

export interface ReadPhoto {
  contentType: PhotoType;
  /** The image re-encoded upright with no metadata at all: what is stored and served. */
  image: Uint8Array;
  thumbnail: Uint8Array;
  width: number;
  height: number;
  latitude: number | null;
  longitude: number | null;
  /** When it was taken, as the camera's clock wrote it (no time zone in the file is read as UTC). */
  takenAt: Date | null;
}

const THUMBNAIL_PX = 320;
/** Larger images are refused before decoding (a small file can claim a huge canvas). */
const MAX_PIXELS = 100_000_000;

const refuse = (message: string) => new AppError('unsupported_media_type', message, { file: [message] });

/**
 * Reads a site photo: checks the type from the bytes, keeps only position and time from its
 * metadata, and makes the upright, metadata-free image and its thumbnail that Runnel serves.
 */
export async function readPhoto(bytes: Uint8Array, fileName: string): Promise<ReadPhoto> {
  const type = sniffPhotoType(bytes);
  if (type === 'heic') throw refuse(`“${fileName}” is a HEIC photo, which this server cannot decode: export it as JPEG (most phones can share it that way) and upload that`);
  if (!type) throw refuse(`“${fileName}” is not a JPEG or PNG image`);
  let meta: sharp.Metadata;
  try {
    meta = await sharp(bytes, { limitInputPixels: MAX_PIXELS }).metadata();
  } catch {
    throw refuse(`“${fileName}” looks like an image but cannot be read; it may be damaged`);
  }
  if (!meta.width || !meta.height) throw refuse(`“${fileName}” has no picture in it`);
  const tags = (await exifr.parse(bytes, { gps: true, pick: ['DateTimeOriginal', 'CreateDate', 'GPSLatitude', 'GPSLatitudeRef', 'GPSLongitude', 'GPSLongitudeRef'] }).catch(() => null)) as
    | { latitude?: number; longitude?: number; DateTimeOriginal?: Date; CreateDate?: Date }
    | null
    | undefined;
  const latitude = Number.isFinite(tags?.latitude) && Math.abs(tags!.latitude!) <= 90 ? tags!.latitude! : null;
  const longitude = Number.isFinite(tags?.longitude) && Math.abs(tags!.longitude!) <= 180 ? tags!.longitude! : null;
  const taken = tags?.DateTimeOriginal ?? tags?.CreateDate ?? null;
  try {
    // rotate() applies the orientation tag; sharp writes no metadata unless asked, so all of it is dropped.
    const upright = sharp(bytes, { limitInputPixels: MAX_PIXELS }).rotate();
    const image = type === 'image/jpeg' ? await upright.clone().jpeg({ quality: 88 }).toBuffer({ resolveWithObject: true }) : await upright.clone().png().toBuffer({ resolveWithObject: true });
    const thumbnail = await upright.clone().resize(THUMBNAIL_PX, THUMBNAIL_PX, { fit: 'inside', withoutEnlargement: true }).jpeg({ quality: 80 }).toBuffer();
    return {
      contentType: type,
      image: new Uint8Array(image.data),
      thumbnail: new Uint8Array(thumbnail),
      width: image.info.width,
      height: image.info.height,
      latitude: latitude !== null && longitude !== null ? latitude : null,
      longitude: latitude !== null && longitude !== null ? longitude : null,
      takenAt: taken instanceof Date && !Number.isNaN(taken.getTime()) ? taken : null,
    };
  } catch {
    throw refuse(`“${fileName}” could not be decoded; it may be damaged`);
  }
}
