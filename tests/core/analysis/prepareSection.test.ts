import { describe, expect, it } from 'vitest';
import { analysePrepared, analyseSection } from '../../../src/core/analysis/analyseSection';
import { createPreparationBuffer } from '../../../src/core/analysis/preparationBuffer';
import { prepareSection, prepareSectionScratch, type SectionPreparation } from '../../../src/core/analysis/prepareSection';
import type { Section, XZ } from '../../../src/core/model/section';
import { expectClose } from '../../expectClose';
import { methodExample } from './sections';

// Everything a preparation holds, typed arrays as plain lists, so two preparations compare as values.
function snapshot(p: SectionPreparation): unknown {
  return JSON.parse(JSON.stringify(p, (_k, v) => (ArrayBuffer.isView(v) ? Array.from(v as Float64Array) : v)));
}

// A second section unlike the first: every horizon line raised 123 m, so its clipped lines differ
// from the first's in every elevation.
function otherSection(): Section {
  const s = methodExample();
  return { ...s, horizons: s.horizons.map((h) => ({ ...h, line: h.line.map(([x, z]): XZ => [x, z + 123]) })) };
}

describe('prepareSectionScratch with caller-held buffers: re-entrant', () => {
  it('two preparations interleaved, each in its own buffer, equal the same two run apart', () => {
    // Our own check (no outside source needed: the reference is the engine run once per section, alone).
    const s1 = methodExample(), s2 = otherSection();
    const apart1 = snapshot(prepareSection(s1)), apart2 = snapshot(prepareSection(s2));
    const b1 = createPreparationBuffer(), b2 = createPreparationBuffer();
    // Interleaved as two analyses (or two callers of one module) would run: start one, start the
    // other, then read both. A shared module-level buffer would hand s2's points over s1's lines.
    const p1 = prepareSectionScratch(s1, {}, b1);
    const p2 = prepareSectionScratch(s2, {}, b2);
    expect(snapshot(p1)).toEqual(apart1);
    expect(snapshot(p2)).toEqual(apart2);
    // And the analyses read from the interleaved preparations equal the analyses run apart.
    if (!p1.ok || !p2.ok) throw new Error('sections rejected');
    const a2 = analyseSection(s2, { buffer: createPreparationBuffer() });
    const a1 = analysePrepared(p1.prepared);
    const alone1 = analyseSection(s1), alone2 = analyseSection(s2);
    if (!alone1.ok || !alone2.ok || !a2.ok) throw new Error('sections rejected');
    expect(a1).toEqual(alone1.analysis);
    expect(analysePrepared(p2.prepared)).toEqual(alone2.analysis);
    expect(a2.analysis).toEqual(alone2.analysis);
  });

  it('two buffers share no memory, and a buffered preparation equals one in fresh arrays', () => {
    // Our own check: the reference is prepareSection without a buffer (fresh arrays).
    const b = createPreparationBuffer();
    const scratch = prepareSectionScratch(methodExample(), {}, b);
    const plain = prepareSectionScratch(otherSection(), {}, createPreparationBuffer());
    const kept = prepareSection(methodExample());
    if (!scratch.ok || !plain.ok || !kept.ok) throw new Error('sections rejected');
    expect(snapshot(scratch)).toEqual(snapshot(kept));
    expect(plain.prepared.horizons[0].line.xs.buffer).not.toBe(scratch.prepared.horizons[0].line.xs.buffer);
  });

  it('reusing one buffer overwrites an earlier scratch preparation, as documented', () => {
    // Our own check that the test above can fail: one buffer for both makes the first read s2's lines.
    const b = createPreparationBuffer();
    const p1 = prepareSectionScratch(methodExample(), {}, b);
    prepareSectionScratch(otherSection(), {}, b);
    if (!p1.ok) throw new Error('section rejected');
    // Vertex 1 of the first horizon is the triangle's peak (tests/core/analysis/sections.ts), raised 123 m in s2.
    const apart = prepareSection(methodExample());
    if (!apart.ok) throw new Error('section rejected');
    const z = p1.prepared.horizons[0].line.zs, zApart = apart.prepared.horizons[0].line.zs;
    expectClose(z[1] - zApart[1], 123, 1e-12);
  });
});
