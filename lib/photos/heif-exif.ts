/**
 * The Exif block of a HEIF/HEIC photo, found by walking its boxes (ISO/IEC 14496-12 box layout
 * [R85], ISO/IEC 23008-12 items [R86]; docs/references/photos.md): the `Exif` item named in
 * `iinf`, located through `iloc` either in the file (construction method 0, as phones write it)
 * or inside the `idat` box (method 1, as some encoders write it). Returns the TIFF-headed bytes that Exif readers take,
 * or null when the file
 * has none or its boxes do not add up. Every offset is checked against the file's length, and the
 * walk visits each box once, so a crafted file cannot send it out of bounds or round in circles.
 */
interface Box {
  type: string;
  start: number;
  end: number;
}

class Reader {
  constructor(private readonly bytes: Uint8Array) {}
  get length() {
    return this.bytes.length;
  }
  uint(at: number, size: number): number {
    if (size === 0) return 0;
    if (at < 0 || at + size > this.bytes.length) throw new RangeError('outside the file');
    let v = 0;
    for (let i = 0; i < size; i++) v = v * 256 + this.bytes[at + i];
    return v;
  }
  text(at: number, size: number): string {
    return String.fromCharCode(...Array.from({ length: size }, (_, i) => this.uint(at + i, 1)));
  }
  slice(from: number, to: number): Uint8Array {
    if (from < 0 || to > this.bytes.length || from > to) throw new RangeError('outside the file');
    return this.bytes.subarray(from, to);
  }
}

/** The boxes laid end to end between `from` and `to`. */
function boxesIn(r: Reader, from: number, to: number): Box[] {
  const boxes: Box[] = [];
  let at = from;
  while (at + 8 <= to) {
    let size = r.uint(at, 4);
    const type = r.text(at + 4, 4);
    let header = 8;
    if (size === 1) {
      size = r.uint(at + 8, 8);
      header = 16;
    } else if (size === 0) {
      size = to - at;
    }
    if (size < header || at + size > to) break;
    boxes.push({ type, start: at + header, end: at + size });
    at += size;
  }
  return boxes;
}

const child = (r: Reader, parent: Box, type: string, fullBox = false) =>
  boxesIn(r, parent.start + (fullBox ? 4 : 0), parent.end).find((b) => b.type === type);

function exifItemId(r: Reader, iinf: Box): number | null {
  const version = r.uint(iinf.start, 1);
  const entriesAt = iinf.start + 4 + (version === 0 ? 2 : 4);
  for (const infe of boxesIn(r, entriesAt, iinf.end)) {
    if (infe.type !== 'infe') continue;
    const v = r.uint(infe.start, 1);
    if (v < 2) continue;
    const idSize = v === 3 ? 4 : 2;
    const id = r.uint(infe.start + 4, idSize);
    if (r.text(infe.start + 4 + idSize + 2, 4) === 'Exif') return id;
  }
  return null;
}

function exifExtent(r: Reader, iloc: Box, itemId: number): { method: number; offset: number; length: number } | null {
  const version = r.uint(iloc.start, 1);
  let at = iloc.start + 4;
  const sizes = r.uint(at, 1);
  const more = r.uint(at + 1, 1);
  const offsetSize = sizes >> 4;
  const lengthSize = sizes & 0x0f;
  const baseOffsetSize = more >> 4;
  const indexSize = version === 1 || version === 2 ? more & 0x0f : 0;
  at += 2;
  const countSize = version < 2 ? 2 : 4;
  const items = r.uint(at, countSize);
  at += countSize;
  for (let i = 0; i < items && at < iloc.end; i++) {
    const id = r.uint(at, countSize);
    at += countSize;
    let method = 0;
    if (version === 1 || version === 2) {
      method = r.uint(at, 2) & 0x0f;
      at += 2;
    }
    at += 2; // data reference index
    const base = r.uint(at, baseOffsetSize);
    at += baseOffsetSize;
    const extents = r.uint(at, 2);
    at += 2;
    const first = { offset: 0, length: 0 };
    for (let e = 0; e < extents; e++) {
      at += indexSize;
      const offset = r.uint(at, offsetSize);
      at += offsetSize;
      const length = r.uint(at, lengthSize);
      at += lengthSize;
      if (e === 0) Object.assign(first, { offset, length });
    }
    if (id === itemId) return extents >= 1 ? { method, offset: base + first.offset, length: first.length } : null;
  }
  return null;
}

export function heifExifBlock(bytes: Uint8Array): Uint8Array | null {
  const r = new Reader(bytes);
  try {
    const meta = boxesIn(r, 0, r.length).find((b) => b.type === 'meta');
    if (!meta) return null;
    const iinf = child(r, meta, 'iinf', true);
    const iloc = child(r, meta, 'iloc', true);
    if (!iinf || !iloc) return null;
    const id = exifItemId(r, iinf);
    if (id === null) return null;
    const extent = exifExtent(r, iloc, id);
    if (!extent || extent.length < 4) return null;
    let start: number;
    if (extent.method === 0) start = extent.offset;
    else if (extent.method === 1) {
      const idat = child(r, meta, 'idat', true);
      if (!idat) return null;
      start = idat.start + extent.offset;
      if (start + extent.length > idat.end) return null;
    } else return null;
    const block = r.slice(start, start + extent.length);
    // The item starts with the distance to the TIFF header (past an "Exif\0\0" name).
    const skip = 4 + new Reader(block).uint(0, 4);
    if (skip + 8 > block.length) return null;
    return block.subarray(skip);
  } catch (error) {
    if (error instanceof RangeError) return null;
    throw error;
  }
}
