import fs from 'node:fs';
import path from 'node:path';
import exifr from 'exifr';
import { describe, expect, it } from 'vitest';
import { heifExifBlock } from '@/lib/photos/heif-exif';

const heic = new Uint8Array(
  fs.readFileSync(path.join(process.cwd(), 'tests/fixtures/photos/walk-54.0075N-2.9015W.heic')),
);

describe('the Exif block of a HEIC photo', () => {
  it('is found in the idat box where libheif’s encoder puts it, and reads as the position and time written (tests/fixtures/photos/README.md)', async () => {
    const block = heifExifBlock(heic);
    expect(block).not.toBeNull();
    expect([...block!.subarray(0, 4)]).toEqual([0x49, 0x49, 0x2a, 0x00]); // "II*\0": a little-endian TIFF header
    const tags = await exifr.parse(block!, { gps: true });
    expect(tags.latitude).toBeCloseTo(54.0075, 6);
    expect(tags.longitude).toBeCloseTo(-2.9015, 6);
    expect(tags.DateTimeOriginal.toISOString()).toBe('2026-04-12T10:15:00.000Z');
  });

  it('gives null, never an error or a read past the end, for a file cut short at any length or for noise', () => {
    for (let n = 0; n < heic.length; n += 7) expect(() => heifExifBlock(heic.subarray(0, n))).not.toThrow();
    expect(heifExifBlock(heic.subarray(0, 300))).toBeNull();
    const noise = new Uint8Array(4096).map((_, i) => (i * 7919 + 13) % 256);
    expect(heifExifBlock(noise)).toBeNull();
    // A box that claims to run past the end of the file is not followed.
    const lying = heic.slice();
    lying.set([0x7f, 0xff, 0xff, 0xff], 0x1c); // the meta box's size
    expect(heifExifBlock(lying)).toBeNull();
  });
});
