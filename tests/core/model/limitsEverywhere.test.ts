// One set of limits (src/core/model/limits.ts) where data enters: renames, the section-file opener, the
// project schema and the document the browser keeps. Work accepted in one place and refused in another
// is work lost; these checks hold every entry to the same numbers and the same words.
import { describe, expect, it } from 'vitest';
import { addHorizon } from '../../../src/core/model/commands/addHorizon';
import { importHorizons } from '../../../src/core/model/commands/importHorizons';
import { renameHorizon } from '../../../src/core/model/commands/renameHorizon';
import { scenarioDuplicate } from '../../../src/core/model/commands/scenarioDuplicate';
import { scenarioRename } from '../../../src/core/model/commands/scenarioRename';
import { docLimitProblem } from '../../../src/core/model/docLimitProblem';
import { LIMITS } from '../../../src/core/model/limits';
import { checkProjectDoc } from '../../../src/core/model/projectSchema';
import { validateSection } from '../../../src/core/model/validateSection';
import { parseProjectText, serializeProject } from '../../../src/io/projectFile';
import { sampleDoc, SAMPLE_SECTION } from '../../io/sampleDoc';

const long = (n: number) => 'N'.repeat(n);

function section(horizons: number, vertices: number) {
  const hs = [];
  for (let k = 0; k < horizons; k++) {
    const line: [number, number][] = [];
    for (let i = 0; i < vertices; i++) line.push([(i / (vertices - 1)) * 1000, -100 - k * 10]);
    hs.push({ name: `H${k}`, line, regional: [[0, -100 - k * 10], [1000, -100 - k * 10]] });
  }
  return { units: 'm', pins: [10, 990], horizons: hs };
}

describe('names over the limit', () => {
  it('renameHorizon and scenarioRename refuse a name one character over the limit and accept one at it', () => {
    const doc = sampleDoc();
    const h = doc.horizons[0].id;
    expect(renameHorizon(doc, h, long(LIMITS.nameLength + 1))).toBe(doc);
    expect(renameHorizon(doc, h, long(LIMITS.nameLength)).horizons[0].name).toHaveLength(LIMITS.nameLength);
    const s = doc.scenarios[0].id;
    expect(scenarioRename(doc, s, long(600))).toBe(doc);
    expect(scenarioRename(doc, s, long(LIMITS.nameLength)).scenarios[0].name).toHaveLength(LIMITS.nameLength);
  });

  it('names made unique by a suffix (" (2)", " copy") stay within the limit, and the result is kept and restored', () => {
    let doc = renameHorizon(sampleDoc(), sampleDoc().horizons[0].id, long(LIMITS.nameLength));
    doc = addHorizon(doc, { id: 'hx', name: long(LIMITS.nameLength), colour: '#000', pointsPx: [[0, 0], [1, 1]] });
    doc = importHorizons(doc, [{ name: long(LIMITS.nameLength), line: [[0, 0], [1, 1]] }], 'm');
    doc = scenarioRename(doc, doc.scenarios[0].id, long(LIMITS.nameLength));
    doc = scenarioDuplicate(doc, doc.scenarios[0].id);
    for (const name of [...doc.horizons.map((x) => x.name), ...doc.scenarios.map((x) => x.name)]) expect(name.length).toBeLessThanOrEqual(LIMITS.nameLength);
    expect(new Set(doc.horizons.map((x) => x.name)).size).toBe(doc.horizons.length);
    expect(docLimitProblem(doc)).toBeNull();
    expect(checkProjectDoc(JSON.parse(JSON.stringify(doc))).ok).toBe(true);
  });
});

describe('the project schema and the kept document use the same limits and words', () => {
  it('a 501-character horizon name is refused by the schema with the shared words, not "Too big"', () => {
    const doc = sampleDoc();
    doc.horizons[0].name = long(501);
    const r = checkProjectDoc(doc);
    expect(r.ok).toBe(false);
    if (!r.ok) {
      expect(r.message).toContain('the horizon name is too long (501 characters; the limit is 500)');
      expect(r.message).not.toMatch(/too big/i);
    }
    expect(docLimitProblem(doc)).toBe('the horizon name is too long (501 characters; the limit is 500)');
  });

  it('2,001 horizons: the schema and docLimitProblem say "too many horizons for the app (2001; the limit is 2000)"', () => {
    const doc = sampleDoc();
    const h = doc.horizons[0];
    doc.horizons = Array.from({ length: 2001 }, (_, i) => ({ ...h, id: `h${i + 1}`, name: `H${i}` }));
    const words = 'too many horizons for the app (2001; the limit is 2000)';
    expect(docLimitProblem(doc)).toBe(words);
    const r = checkProjectDoc(doc);
    expect(!r.ok && r.message).toContain(words);
  });

  it('every document docLimitProblem passes, the schema passes (sample, and at each limit)', () => {
    const doc = sampleDoc();
    doc.title = long(LIMITS.nameLength);
    doc.author = long(LIMITS.nameLength);
    expect(docLimitProblem(doc)).toBeNull();
    expect(checkProjectDoc(doc).ok).toBe(true);
  });
});

describe('section files: the app and the command line read them through one check', () => {
  it('2,001 horizons and 200,001 vertices in a line are refused with the shared words by the app\'s opener and validateSection', () => {
    const cases: [ReturnType<typeof section>, string][] = [
      [section(2001, 2), 'too many horizons for the app (2001; the limit is 2000)'],
      [section(1, LIMITS.pointsPerLine + 1), 'too many vertices for the app (200001; the limit is 200000)'],
    ];
    for (const [s, words] of cases) {
      const v = validateSection(s);
      expect(!v.ok && v.problems[0].message).toContain(words);
      const opened = parseProjectText(JSON.stringify(s), 'big.json');
      expect(opened.ok).toBe(false);
      if (!opened.ok) {
        expect(opened.message).toContain(words);
        expect(opened.message).not.toContain('damaged');
      }
    }
  });

  it('a 150,000-vertex section file (under the limit) opens in the app and its document is kept and restored', () => {
    const opened = parseProjectText(JSON.stringify(section(1, 150_000)), 'long.json');
    expect(opened.ok).toBe(true);
    if (opened.ok) {
      expect(docLimitProblem(opened.doc)).toBeNull();
      expect(parseProjectText(serializeProject(opened.doc, null)).ok).toBe(true);
    }
  });

  it('a horizon name over the limit in a section file is refused, naming the limit', () => {
    const s = JSON.parse(JSON.stringify(SAMPLE_SECTION));
    s.horizons[0].name = long(501);
    const v = validateSection(s);
    expect(!v.ok && v.problems.map((p) => p.message).join(' ')).toContain('the horizon name is too long (501 characters; the limit is 500)');
  });

  it('coordinates beyond ±1e9 and a section narrower than the smallest extent are refused, not analysed', () => {
    const far = JSON.parse(JSON.stringify(SAMPLE_SECTION));
    far.horizons[0].line[2] = [500, 1e160];
    const v = validateSection(far);
    expect(!v.ok && v.problems[0].code).toBe('out-of-range');
    expect(!v.ok && v.problems[0].message).toContain('outside the range Foldroot computes in (1e160');
    const tiny = { units: 'm', pins: [1e-300, 3e-300], horizons: [{ name: 'A', line: [[0, -1e-300], [4e-300, -1e-300]], regional: [[0, 0], [4e-300, 0]] }] };
    const t = validateSection(tiny);
    expect(!t.ok && t.problems[0].message).toContain('the section is too small to measure');
  });
});
