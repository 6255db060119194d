import sharp from 'sharp';

/** Degrees → the EXIF "d/1 m/1 s/10000" rational triple sharp writes into the GPS block. */
function dms(deg: number): string {
  const a = Math.abs(deg);
  const d = Math.floor(a);
  const m = Math.floor((a - d) * 60);
  const s = Math.round(((a - d) * 60 - m) * 60 * 10000);
  return `${d}/1 ${m}/1 ${s}/10000`;
}

/**
 * A small JPEG made here, with position, time and a camera owner's name in its metadata, as a
 * phone writes them. Free of app imports, so browser tests can make their files too.
 */
export async function jpegWithPosition(
  latitudeDeg: number,
  longitudeDeg: number,
  takenAt = '2026:04:12 09:30:00',
  colour = '#5b8a72',
): Promise<Uint8Array> {
  const bytes = await sharp({ create: { width: 96, height: 64, channels: 3, background: colour } })
    .jpeg()
    .withExif({
      IFD0: { Make: 'Fieldcam', Artist: 'Private Camera Owner' },
      IFD2: { DateTimeOriginal: takenAt },
      IFD3: {
        GPSLatitudeRef: latitudeDeg >= 0 ? 'N' : 'S',
        GPSLatitude: dms(latitudeDeg),
        GPSLongitudeRef: longitudeDeg >= 0 ? 'E' : 'W',
        GPSLongitude: dms(longitudeDeg),
      },
    })
    .toBuffer();
  return new Uint8Array(bytes);
}

/** A small JPEG with no metadata at all (a photo a messaging app has stripped). */
export async function plainJpeg(colour = '#8a6f4a'): Promise<Uint8Array> {
  return new Uint8Array(
    await sharp({ create: { width: 80, height: 60, channels: 3, background: colour } })
      .jpeg()
      .toBuffer(),
  );
}
