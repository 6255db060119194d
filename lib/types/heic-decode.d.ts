declare module 'heic-decode' {
  interface DecodedHeic {
    width: number;
    height: number;
    /** RGBA, 4 bytes a pixel, row by row. */
    data: Uint8ClampedArray;
  }
  interface HeicImage {
    width: number;
    height: number;
    decode(): Promise<DecodedHeic>;
  }
  function decode(input: { buffer: Uint8Array }): Promise<DecodedHeic>;
  namespace decode {
    function all(input: { buffer: Uint8Array }): Promise<HeicImage[] & { dispose(): void }>;
  }
  export default decode;
}
