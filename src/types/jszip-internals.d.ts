// Two modules inside jszip 3.10 that its public API does not type: an entry given as already
// compressed data (jszip's own reading of a zip makes these), and its table of compression methods.
declare module 'jszip/lib/compressedObject.js' {
  /** Sizes in bytes; `crc32` of the uncompressed data; `compression` from `jszip/lib/compressions.js`. */
  export default class CompressedObject {
    constructor(compressedSize: number, uncompressedSize: number, crc32: number, compression: unknown, data: Uint8Array);
  }
}
declare module 'jszip/lib/compressions.js' {
  const compressions: { STORE: unknown; DEFLATE: unknown };
  export default compressions;
}
