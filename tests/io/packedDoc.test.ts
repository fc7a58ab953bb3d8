import { describe, expect, it } from 'vitest';
import { packDoc, packPoints, unpackDoc, unpackPoints } from '../../src/io/packedDoc';
import { sampleDoc } from './sampleDoc';

describe('packedDoc', () => {
  it('packs a line as u0, v0, u1, v1, … and unpacks it to the same pairs', () => {
    const line: [number, number][] = [[1.5, -2], [3, 4.25], [-0, 1e-300]];
    const flat = packPoints(line);
    expect(Array.from(flat)).toEqual([1.5, -2, 3, 4.25, -0, 1e-300]);
    expect(unpackPoints(flat)).toEqual(line);
  });

  it('packs an unchanged line once: the same array for the same line, a new one for an edited line', () => {
    const doc = sampleDoc();
    const a = packDoc(doc);
    const b = packDoc({ ...doc, title: 'edited' });
    expect(b.horizons[0].pointsPx).toBe(a.horizons[0].pointsPx);
    const edited = { ...doc, horizons: [{ ...doc.horizons[0], pointsPx: doc.horizons[0].pointsPx.map(([u, v]) => [u, v + 1] as [number, number]) }, ...doc.horizons.slice(1)] };
    expect(packDoc(edited).horizons[0].pointsPx).not.toBe(a.horizons[0].pointsPx);
  });

  it('round-trips a document, regionals included, and leaves unpacked (older) lines as they are', () => {
    const doc = sampleDoc();
    expect(unpackDoc(packDoc(doc))).toEqual(doc);
    expect(unpackDoc(doc)).toEqual(doc);
    expect(unpackDoc(null)).toBeNull();
  });
});
