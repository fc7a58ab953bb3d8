// The base64 of a file too large to be one string: read and encoded a piece at a time, so that a scan file of
// hundreds of megabytes can be embedded in an SVG (a string of its whole base64 would pass the engine's longest
// string, about 2^29 characters, from a file of about 400 MB; the file itself never becomes one string either).
import { bytesToBase64 } from './base64';

/** Bytes read at a time: a multiple of 3, so that the pieces' base64 joins into the base64 of the whole. */
export const BASE64_PIECE_BYTES = 3 * 512 * 1024;

/** What the pieces are read from: a Blob or File (anything whose slices can be read as bytes). */
export interface ByteSource {
  readonly size: number;
  slice(start: number, end: number): { arrayBuffer(): Promise<ArrayBuffer> };
}

type WithToBase64 = Uint8Array & { toBase64?: () => string };

/** Returns the bytes as base64: the engine's own encoder where it has one (Uint8Array.prototype.toBase64), else io/base64. */
function encode(bytes: Uint8Array): string {
  const native = (bytes as WithToBase64).toBase64;
  return typeof native === 'function' ? native.call(bytes) : bytesToBase64(bytes);
}

/**
 * Yields the base64 of `source` in order, one piece of at most `pieceBytes` source bytes (rounded down to a multiple
 * of 3, at least 3) at a time, so that joined they are its base64; nothing for an empty source. The caller keeps or
 * writes each piece (e.g. as a Blob of its own) before the next is read.
 */
export async function* base64Pieces(source: ByteSource, pieceBytes = BASE64_PIECE_BYTES): AsyncGenerator<string> {
  const step = Math.max(3, pieceBytes - (pieceBytes % 3));
  for (let at = 0; at < source.size; at += step) {
    yield encode(new Uint8Array(await source.slice(at, Math.min(source.size, at + step)).arrayBuffer()));
  }
}
