// One section, one Chamberlin verdict: the command line (run as a user runs it) and the app's analysis path
// (a file opened with parseProjectText, analysed by selectAnalysis; a saved section file from sectionFileText)
// give the same depth, or the same "not meaningful", for a file without a resolution, a file that states one,
// and a section digitised on a scan. Check values: triangle folds of base 1000 m and height h over a flat
// regional, L − W = 2·√(500² + h²) − 1000 (plane geometry, analytic): h = 22, 23, 30 and 45 m give 0.968,
// 1.057, 1.799 and 4.040 m, either side of 1 m (10⁻⁴ of the 10 km pin width,
// docs/method.md §Digitising resolution) and of 2.5 m (one pixel of the scan below).
import { spawnSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import type { ProjectDoc } from '../../src/core/model/projectDoc';
import { sectionFileText } from '../../src/io/exportTables';
import { parseProjectText } from '../../src/io/projectFile';
import { selectAnalysis } from '../../src/state/selectors';
import { forwardModelDoc, px } from '../fixtures/forwardModel/forwardModel';

const root = join(import.meta.dirname, '..', '..');
const tmp = mkdtempSync(join(tmpdir(), 'foldroot-resolution-'));
const T = 60_000;

interface Verdict { name: string; chamberlinDepth: number | null }

function cli(name: string, text: string): Verdict[] {
  const file = join(tmp, `${name}.json`);
  writeFileSync(file, text);
  const r = spawnSync('npx', ['tsx', 'src/cli/analyse.ts', file, '--json'], { cwd: root, encoding: 'utf8' });
  expect(r.stderr).toBe('');
  return (JSON.parse(r.stdout) as { horizons: Verdict[] }).horizons.map((h) => ({ name: h.name, chamberlinDepth: h.chamberlinDepth }));
}

function app(doc: ProjectDoc): Verdict[] {
  const out = selectAnalysis(doc).outcome;
  if (!out?.ok) throw new Error('no analysis');
  return out.analysis.horizons.map((h) => ({ name: h.name, chamberlinDepth: h.chamberlinDepth }));
}

function opened(text: string): ProjectDoc {
  const o = parseProjectText(text, 'section.json');
  if (!o.ok) throw new Error(o.message);
  return o.doc;
}

/** A fold of base 1000 m centred at x, its flat regional at z0, height h. */
const fold = (name: string, z0: number, h: number) => ({
  name, line: [[-100, z0], [4500, z0], [5000, z0 + h], [5500, z0], [10_100, z0]], regional: [[-100, z0], [10_100, z0]],
});
const sectionText = (extra: Record<string, unknown> = {}) => JSON.stringify({
  units: 'm', pins: [0, 10_000], ...extra, horizons: [fold('Above', 0, 23), fold('Below', -1000, 22), fold('Steep', -2000, 45)],
});

function expectSame(a: Verdict[], b: Verdict[]) {
  expect(a.map((h) => h.name)).toEqual(b.map((h) => h.name));
  a.forEach((h, i) => {
    expect(h.chamberlinDepth === null).toBe(b[i].chamberlinDepth === null);
    if (h.chamberlinDepth !== null) expect(b[i].chamberlinDepth!).toBeCloseTo(h.chamberlinDepth, 3);
  });
}

describe('the command line and the app give one Chamberlin verdict for one section', () => {
  it('a file without a resolution: 1 m (10⁻⁴ W₀) in both, "Below" not meaningful, "Above" a depth', () => {
    const text = sectionText();
    const c = cli('no-resolution', text);
    const a = app(opened(text));
    expectSame(c, a);
    expect(a.map((h) => h.chamberlinDepth === null)).toEqual([false, true, false]);
    // A = 1000 · 23 / 2 m², L − W = 1.05744 m.
    expect(c[0].chamberlinDepth!).toBeCloseTo(11_500 / (2 * Math.hypot(500, 23) - 1000), 2);
  }, T);

  it('a file stating a resolution of 2 m: both follow it ("Above" not meaningful either), and the app keeps it when it saves', () => {
    const text = sectionText({ resolution: 2 });
    const doc = opened(text);
    expect(doc.resolution).toBe(2);
    const a = app(doc);
    expectSame(cli('stated', text), a);
    expect(a.map((h) => h.chamberlinDepth === null)).toEqual([true, true, false]);
    const saved = sectionFileText(selectAnalysis(doc));
    if (!saved.ok) throw new Error(saved.message);
    expect(JSON.parse(saved.text).resolution).toBe(2);
    expectSame(cli('stated-saved', saved.text), a);
  }, T);

  it('a section digitised on a scan of 2.5 m pixels: its saved section file states 2.5 m and the command line agrees', () => {
    // The forward model (four large folds) plus two gentle folds left out of the fit: L − W = 1.799 m (h = 30 m)
    // is below one 2.5 m pixel, 4.040 m (h = 45 m) above it.
    const doc = forwardModelDoc();
    doc.scan = { id: 'scan-1', name: 'section.png', widthPx: 4800, heightPx: 2000, type: 'image/png' };
    for (const [id, h, z0] of [['g1', 30, -2600], ['g2', 45, -2800]] as const) {
      doc.horizons.push({ id, name: id, colour: '#000000', visible: true, locked: false, projected: [], joins: [],
        pointsPx: fold(id, z0, h).line.map(([x, z]) => px(x, z)) });
      doc.scenarios[0].regionals[id] = [px(-100, z0), px(10_100, z0)];
      doc.scenarios[0].excluded.push(id);
    }
    const a = app(doc);
    expect(a.slice(4).map((h) => h.chamberlinDepth === null)).toEqual([true, false]);
    const saved = sectionFileText(selectAnalysis(doc));
    if (!saved.ok) throw new Error(saved.message);
    expect(JSON.parse(saved.text).resolution).toBe(2.5);
    expectSame(cli('scan-saved', saved.text), a);
    // Opened again in the app (no scan now, the stated 2.5 m kept): the same verdicts.
    expectSame(app(opened(saved.text)), a);
    // Without the scan and without a stated resolution the same lines would get 1 m, and g1 a depth.
    expect(app({ ...doc, scan: null })[4].chamberlinDepth).not.toBeNull();
  }, T);
});
