// The SVG embeds a scan file as base64 written piece by piece: joined, the pieces are the base64 of the whole
// (checked against Node's own encoder, Buffer.toString('base64'), an independent implementation of RFC 4648),
// and a large file never passes through one string.
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { base64Pieces, BASE64_PIECE_BYTES, type ByteSource } from '../../src/io/base64Pieces';

async function collect(source: ByteSource, pieceBytes?: number): Promise<string[]> {
  const out: string[] = [];
  for await (const p of base64Pieces(source, pieceBytes)) out.push(p);
  return out;
}

describe('base64Pieces', () => {
  it('joins into the base64 of the whole for any bytes and piece size', async () => {
    await fc.assert(fc.asyncProperty(fc.uint8Array({ maxLength: 200 }), fc.integer({ min: 1, max: 40 }), async (bytes, piece) => {
      const pieces = await collect(new Blob([bytes]), piece);
      expect(pieces.join('')).toBe(Buffer.from(bytes).toString('base64'));
      // Only the last piece may carry padding: the others are whole groups of three bytes.
      for (const p of pieces.slice(0, -1)) expect(p).not.toContain('=');
    }));
  });

  it('yields nothing for an empty file', async () => {
    expect(await collect(new Blob([]))).toEqual([]);
  });

  it('never holds more than one piece of a large file as a string', async () => {
    // A fake file of four pieces and two bytes, each slice made on demand from its offset. A writer that read the
    // file as one string would yield one piece of its whole base64; pieces of at most 2 MiB characters keep a file
    // of any size (over 400 MB, whose base64 would pass V8's longest string, 2^29 − 24 characters, v8.h
    // String::kMaxLength) writable.
    const size = 4 * BASE64_PIECE_BYTES + 2;
    const byteAt = (i: number) => (i * 2654435761) >>> 24;
    const bytesOf = (start: number, end: number) => {
      const b = new Uint8Array(end - start);
      for (let i = 0; i < b.length; i++) b[i] = byteAt(start + i);
      return b;
    };
    let read = 0;
    const source: ByteSource = { size, slice(start, end) { read += end - start; return { arrayBuffer: () => Promise.resolve(bytesOf(start, end).buffer) }; } };
    const pieces = await collect(source);
    expect(pieces.length).toBe(5);
    for (const p of pieces) expect(p.length).toBeLessThanOrEqual((BASE64_PIECE_BYTES / 3) * 4);
    expect(pieces.join('')).toBe(Buffer.from(bytesOf(0, size)).toString('base64'));
    expect(read).toBe(size);
  });
});
