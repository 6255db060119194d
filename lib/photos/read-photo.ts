import 'server-only';
import exifr from 'exifr';
import sharp from 'sharp';
import { AppError } from '../errors';
import { runInWorker } from '../workers/pool';
import { heifExifBlock } from './heif-exif';

export type PhotoType = 'image/jpeg' | 'image/png';

/** What the bytes are, from their first bytes (never from the name or the declared type). */
export function sniffPhotoType(bytes: Uint8Array): PhotoType | 'heic' | null {
  const starts = (sig: number[], at = 0) => sig.every((b, i) => bytes[at + i] === b);
  if (starts([0xff, 0xd8, 0xff])) return 'image/jpeg';
  if (starts([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a])) return 'image/png';
  // ISO base media "ftyp" box with a HEIF brand.
  const brand = String.fromCharCode(...bytes.slice(8, 12));
  if (starts([0x66, 0x74, 0x79, 0x70], 4) && ['heic', 'heix', 'hevc', 'heim', 'heis', 'mif1', 'msf1'].includes(brand))
    return 'heic';
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
/** HEIC is decoded to raw pixels first (4 bytes each): a lower cap, still above a 48-megapixel phone camera's. */
const MAX_HEIC_PIXELS = 60_000_000;

type Tags = { latitude?: number; longitude?: number; DateTimeOriginal?: Date; CreateDate?: Date } | null | undefined;

/** Position and time only: nothing else is read from the metadata. */
const readTags = (bytes: Uint8Array): Promise<Tags> =>
  exifr
    .parse(bytes, {
      gps: true,
      pick: ['DateTimeOriginal', 'CreateDate', 'GPSLatitude', 'GPSLatitudeRef', 'GPSLongitude', 'GPSLongitudeRef'],
    })
    .catch(() => null) as Promise<Tags>;

const refuse = (message: string) => new AppError('unsupported_media_type', message, { file: [message] });

async function decodedHeic(bytes: Uint8Array, fileName: string) {
  try {
    return await runInWorker('photo.decode-heic', { bytes, maxPixels: MAX_HEIC_PIXELS });
  } catch (error) {
    if (error instanceof AppError) throw error;
    const why =
      error instanceof Error && /megapixels/.test(error.message)
        ? error.message
        : 'it may be damaged, or coded in a way the decoder does not know';
    throw refuse(`“${fileName}” is a HEIC photo that could not be decoded: ${why}. Export it as JPEG and upload that`);
  }
}

/**
 * Reads a site photo: checks the type from the bytes, keeps only position and time from its
 * metadata, and makes the upright, metadata-free image and its thumbnail that Runnel serves
 * (a HEIC photo is served as JPEG).
 */
export async function readPhoto(bytes: Uint8Array, fileName: string): Promise<ReadPhoto> {
  const type = sniffPhotoType(bytes);
  if (!type) throw refuse(`“${fileName}” is not a JPEG, PNG or HEIC image`);
  // A HEIC photo is decoded to pixels (sharp as shipped cannot read HEVC) and stored as JPEG.
  const heic = type === 'heic' ? await decodedHeic(bytes, fileName) : null;
  const input = heic ? heic.rgba : bytes;
  const options: sharp.SharpOptions = heic
    ? { raw: { width: heic.width, height: heic.height, channels: 4 }, limitInputPixels: MAX_PIXELS }
    : { limitInputPixels: MAX_PIXELS };
  const contentType: PhotoType = type === 'image/png' ? 'image/png' : 'image/jpeg';
  let meta: sharp.Metadata;
  try {
    meta = await sharp(input, options).metadata();
  } catch {
    throw refuse(`“${fileName}” looks like an image but cannot be read; it may be damaged`);
  }
  if (!meta.width || !meta.height) throw refuse(`“${fileName}” has no picture in it`);
  // HEIC keeps its Exif in an item of the file's boxes; read it from there, as the JPEG's is read from the JPEG.
  const tags = await readTags(heic ? (heifExifBlock(bytes) ?? bytes) : bytes);
  const latitude = Number.isFinite(tags?.latitude) && Math.abs(tags!.latitude!) <= 90 ? tags!.latitude! : null;
  const longitude = Number.isFinite(tags?.longitude) && Math.abs(tags!.longitude!) <= 180 ? tags!.longitude! : null;
  const taken = tags?.DateTimeOriginal ?? tags?.CreateDate ?? null;
  try {
    // rotate() applies the orientation tag; sharp writes no metadata unless asked, so all of it is dropped.
    // (HEIC pixels come out of the decoder upright already and carry no tag, so rotate() leaves them.)
    const upright = sharp(input, options).rotate();
    const image =
      contentType === 'image/jpeg'
        ? await upright.clone().jpeg({ quality: 88 }).toBuffer({ resolveWithObject: true })
        : await upright.clone().png().toBuffer({ resolveWithObject: true });
    const thumbnail = await upright
      .clone()
      .resize(THUMBNAIL_PX, THUMBNAIL_PX, { fit: 'inside', withoutEnlargement: true })
      .jpeg({ quality: 80 })
      .toBuffer();
    return {
      contentType,
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
