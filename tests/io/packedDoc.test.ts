import { describe, expect, it } from 'vitest';
import { createLineSender, packDoc, packedDelta, packPoints, receivePackedDelta, unpackDoc, unpackPoints } from '../../src/io/packedDoc';
import type { ProjectDoc } from '../../src/core/model/projectDoc';
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

describe('packedDoc: a receiver that keeps the lines between documents', () => {
  const moved = (doc: ProjectDoc, dv: number): ProjectDoc => {
    const s = doc.scenarios[0];
    const id = doc.horizons[0].id;
    return { ...doc, scenarios: [{ ...s, regionals: { ...s.regionals, [id]: s.regionals[id].map(([u, v]) => [u, v + dv] as [number, number]) } }, ...doc.scenarios.slice(1)] };
  };

  it('gives the receiver each document packed as packDoc packs it, sending only the lines it does not hold', () => {
    const sender = createLineSender();
    const held = new Map<number, Float64Array>();
    const doc = sampleDoc();
    const lineCount = doc.horizons.length + Object.keys(doc.scenarios[0].regionals).length;
    const first = packedDelta(sender, packDoc(doc));
    expect(first.lines).toHaveLength(lineCount);
    expect(unpackDoc(receivePackedDelta(held, first))).toEqual(doc);
    // One regional moved: only it is sent, and the receiver's document is the edited one.
    const edited = moved(doc, 3);
    const second = packedDelta(sender, packDoc(edited));
    expect(second.lines).toHaveLength(1);
    expect(unpackDoc(receivePackedDelta(held, second))).toEqual(edited);
    // The receiver keeps only the last document's lines; undo back to the first sends the old regional again.
    expect(held.size).toBe(lineCount);
    const back = packedDelta(sender, packDoc(doc));
    expect(back.lines).toHaveLength(1);
    expect(unpackDoc(receivePackedDelta(held, back))).toEqual(doc);
  });

  it('sends copies (their buffers may be transferred), and a receiver missing a line refuses the document', () => {
    const sender = createLineSender();
    const doc = sampleDoc();
    const packed = packDoc(doc);
    const delta = packedDelta(sender, packed);
    expect(delta.lines[0][1]).not.toBe(packed.horizons[0].pointsPx);
    expect(Array.from(delta.lines[0][1])).toEqual(Array.from(packed.horizons[0].pointsPx));
    // A fresh receiver (the worker replaced) does not hold the lines a later delta leaves out.
    expect(() => receivePackedDelta(new Map(), packedDelta(sender, packDoc(moved(doc, 1))))).toThrow(/never sent/);
  });
});
