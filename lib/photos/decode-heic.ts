export interface DecodedPixels {
  width: number;
  height: number;
  /** RGBA, 4 bytes a pixel, row by row, already turned upright by the file's own rotation and mirror boxes. */
  rgba: Uint8Array;
}

/**
 * Decodes the primary picture of a HEIC/HEIF photo with libheif (built to WebAssembly, so it runs
 * wherever Node does). Decoding is CPU work on the calling thread: it runs in the worker pool.
 * A picture larger than `maxPixels` is refused from its header, before any decoding.
 */
export async function decodeHeic(bytes: Uint8Array, maxPixels: number): Promise<DecodedPixels> {
  // Loaded on first use: the decoder is 2 MB of WebAssembly that other worker tasks never need.
  const { default: decode } = await import('heic-decode');
  const images = await decode.all({ buffer: bytes });
  try {
    const primary = images[0];
    if (!primary || primary.width <= 0 || primary.height <= 0) throw new Error('the file holds no picture');
    if (primary.width * primary.height > maxPixels)
      throw new Error(
        `the picture is ${primary.width} × ${primary.height} pixels, larger than the ${Math.round(maxPixels / 1e6)} megapixels allowed`,
      );
    const pixels = await primary.decode();
    return {
      width: pixels.width,
      height: pixels.height,
      rgba: new Uint8Array(pixels.data.buffer, pixels.data.byteOffset, pixels.data.byteLength),
    };
  } finally {
    images.dispose();
  }
}
