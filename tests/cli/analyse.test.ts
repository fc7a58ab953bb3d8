import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { analyseSection } from '../../src/core/analysis/analyseSection';
import { docToSection } from '../../src/core/model/docToSection';
import type { ProjectDoc } from '../../src/core/model/projectDoc';
import { toJsonReport } from '../../src/cli/toJsonReport';
import { PROJECT_FIXTURE, SECOND_SCENARIO, methodExampleProject, projectFileText } from './projectFixture';

// The command line run as a user runs it: `npx tsx src/cli/analyse.ts FILE [--json] [--scenario NAME]`.
const root = join(import.meta.dirname, '..', '..');
const fixtures = join(root, 'tests', 'fixtures', 'sections');
const tmp = mkdtempSync(join(tmpdir(), 'foldroot-cli-'));

function analyse(...args: string[]) {
  const r = spawnSync('npx', ['tsx', 'src/cli/analyse.ts', ...args], { cwd: root, encoding: 'utf8' });
  return { code: r.status, stdout: r.stdout, stderr: r.stderr };
}

function writeCase(name: string, content: unknown): string {
  const file = join(tmp, `${name}.json`);
  writeFileSync(file, typeof content === 'string' ? content : JSON.stringify(content));
  return file;
}

const example = () => JSON.parse(readFileSync(join(fixtures, 'method-example.json'), 'utf8'));
const T = 60_000;

describe('analyse FILE --json', () => {
  it('prints exactly the JSON report of src/cli/README.md for the synthetic example of docs/method.md §Check values', () => {
    // Source: the synthetic example of docs/method.md §Check values: slope −1000 m, intercept 3 km², zd = 3000 m.
    const r = analyse(join(fixtures, 'method-example.json'), '--json');
    expect(r.code).toBe(0);
    const j = JSON.parse(r.stdout);
    expect(Object.keys(j)).toEqual(['pinWidth', 'referenceElevation', 'horizons', 'areaDepth', 'regime', 'notes']);
    expect(Object.keys(j.horizons[0])).toEqual(['name', 'included', 'excessArea', 'regionalElevation', 'depth', 'chamberlinDepth', 'lpsStrain', 'pieces', 'bedLength', 'regionalLength', 'projectedAreaShare', 'residual', 'cutoffs']);
    expect(j.regime).toBe('shortening');
    expect(j.horizons[0].pieces).toBe(1);
    expect(j.horizons[0].cutoffs).toEqual([]);
    expect(Object.keys(j.areaDepth)).toEqual(['n', 'slope', 'intercept', 'displacement', 'detachmentDepth', 'detachmentElevation', 'r2', 'detachmentDepthCI95', 'displacementCI95']);
    expect(j.horizons.map((h: { name: string }) => h.name)).toEqual(['H1', 'H2', 'H3', 'H4']);
    expect(j.areaDepth.slope).toBeCloseTo(-1000, 6);
    expect(j.areaDepth.intercept).toBeCloseTo(3e6, 3);
    expect(j.areaDepth.detachmentDepth).toBeCloseTo(3000, 6);
    expect(j.areaDepth.detachmentElevation).toBeCloseTo(-3000, 6);
    expect(j.notes.some((n: string) => n.includes('licensed professional'))).toBe(true);
  }, T);

  it('--help prints the usage and the stated resolution rule, exit code 0', () => {
    const r = analyse('--help');
    expect(r.code).toBe(0);
    expect(r.stdout).toMatch(/^usage: analyse FILE \[--json\] \[--scenario NAME\]/);
    expect(r.stdout).toContain('else 1e-4 of the\npin width');
  }, T);
  it('accepts a section embedded under "section"', () => {
    const a = analyse(writeCase('embedded', { section: example() }), '--json');
    const b = analyse(join(fixtures, 'method-example.json'), '--json');
    expect(a.code).toBe(0);
    expect(a.stdout).toBe(b.stdout);
  }, T);
  it('exits 0 with areaDepth null and the reason in notes when no line is possible', () => {
    const r = analyse(join(fixtures, 'one-horizon.json'), '--json');
    expect(r.code).toBe(0);
    const j = JSON.parse(r.stdout);
    expect(j.areaDepth).toBeNull();
    expect(j.notes[0]).toContain('Fewer than two usable horizons');
  }, T);

  it('reports a positive slope as no detachment, with a null depth', () => {
    const j = JSON.parse(analyse(join(fixtures, 'no-detachment.json'), '--json').stdout);
    expect(j.areaDepth.detachmentDepth).toBeNull();
    expect(j.notes[0]).toContain('no detachment below these horizons');
  }, T);
});

/** The JSON the command line must print for the project's scenario: the engine on docToSection's section. */
function expectedJson(doc: ProjectDoc, scenarioId?: string): string {
  const ds = docToSection(doc, scenarioId);
  if (!ds.ok) throw new Error(ds.message);
  const out = analyseSection(ds.section);
  if (!out.ok) throw new Error(out.problems[0].message);
  return `${JSON.stringify(toJsonReport(out.analysis), null, 2)}\n`;
}

describe('analyse PROJECT_FILE: the project file the app saves', () => {
  // Written fresh by the app's serializeProject on every run, so the test follows the real format.
  const text = projectFileText();
  const file = writeCase('method-example.foldroot', text);
  const saved = JSON.parse(text) as { doc: ProjectDoc };

  it('keeps tests/fixtures/sections/project-embedded.json equal to what serializeProject writes (REGEN=1 rewrites it)', () => {
    if (process.env.REGEN === '1') writeFileSync(PROJECT_FIXTURE, text);
    expect(readFileSync(PROJECT_FIXTURE, 'utf8'), 'the fixture is out of date: run REGEN=1 npx vitest run tests/cli and review it').toBe(text);
  });

  it('analyses the active scenario exactly as analyseSection(docToSection(doc).section)', () => {
    const r = analyse(PROJECT_FIXTURE, '--json');
    expect(r.stderr).toBe('');
    expect(r.code).toBe(0);
    expect(r.stdout).toBe(expectedJson(saved.doc));
    // Source: the synthetic example of docs/method.md §Check values (slope −1000 m, intercept 3 km², zd = 3000 m), through the
    // stand-in calibration's pixel round trip, so to rounding only.
    const j = JSON.parse(r.stdout);
    expect(j.areaDepth.slope).toBeCloseTo(-1000, 6);
    expect(j.areaDepth.intercept / 3e6).toBeCloseTo(1, 9);
    expect(j.areaDepth.detachmentDepth).toBeCloseTo(3000, 6);
    expect(j.notes.at(-1)).toContain('licensed professional');
  }, T);

  it('--scenario NAME analyses that scenario instead', () => {
    const r = analyse(file, '--json', '--scenario', SECOND_SCENARIO);
    expect(r.code).toBe(0);
    expect(r.stdout).toBe(expectedJson(saved.doc, 'scenario-2'));
    const j = JSON.parse(r.stdout);
    expect(j.areaDepth.n).toBe(3);
    expect(j.horizons.find((h: { name: string }) => h.name === 'H4').included).toBe(false);
    expect(analyse(file, '--json', `--scenario=${SECOND_SCENARIO}`).stdout).toBe(r.stdout);
  }, T);

  it('names the project and the scenario above the table', () => {
    const r = analyse(file, '--scenario', SECOND_SCENARIO);
    expect(r.code).toBe(0);
    expect(r.stdout.split('\n')[0]).toBe(`Project "Method example", scenario "${SECOND_SCENARIO}".`);
    expect(r.stdout).toMatch(/^H4\s+no\s/m);
  }, T);

  it('leaves out a horizon with no regional, with a note as in the app', () => {
    const doc = methodExampleProject();
    const h4 = doc.horizons.find((h) => h.name === 'H4')!.id;
    const regionals = Object.fromEntries(Object.entries(doc.scenarios[0].regionals).filter(([id]) => id !== h4));
    doc.scenarios[0] = { ...doc.scenarios[0], regionals };
    const r = analyse(writeCase('no-regional', projectFileText(doc)), '--json');
    expect(r.code).toBe(0);
    const j = JSON.parse(r.stdout);
    expect(j.horizons.map((h: { name: string }) => h.name)).toEqual(['H1', 'H2', 'H3']);
    expect(j.notes[0]).toBe('Horizon "H4" is left out: no regional yet.');
  }, T);

  it('accepts a version-0 project file, migrated by the core migrations', () => {
    const r = analyse(writeCase('v0', { format: 'foldroot-project', version: 0, title: 'Old', section: example() }), '--json');
    expect(r.code).toBe(0);
    // Source: the synthetic example of docs/method.md §Check values, to rounding after the migration's pixel round trip.
    expect(JSON.parse(r.stdout).areaDepth.detachmentDepth).toBeCloseTo(3000, 6);
  }, T);

  const notReady: [string, () => unknown, string[], RegExp][] = [
    ['not calibrated', () => projectFileText({ ...methodExampleProject(), calibration: null }), [], /not calibrated/],
    ['without pins', () => {
      const doc = methodExampleProject();
      doc.scenarios[0] = { ...doc.scenarios[0], pinsPx: null };
      return projectFileText(doc);
    }, [], /scenario "Base case" has no pins/],
    ['with no horizon ready', () => {
      const doc = methodExampleProject();
      doc.scenarios[0] = { ...doc.scenarios[0], regionals: {} };
      return projectFileText(doc);
    }, [], /scenario "Base case" has no horizon ready to analyse: "H1" \(no regional yet\), .*"H4" \(no regional yet\)/],
    ['with no horizons', () => projectFileText({ ...methodExampleProject(), horizons: [] }), [], /the project has no horizons/],
    ['asked for a scenario it lacks', () => projectFileText(), ['--scenario', 'Nope'], /no scenario named "Nope"; its scenarios are "Base case", "Without H4"/],
    ['damaged after saving', () => projectFileText().replace('"name":"H1"', '"name":"H9"'), [], /damaged/],
    ['of a newer version', () => ({ format: 'foldroot-project', version: 99, doc: {} }), [], /version 99/],
    ['given --scenario for a section file', () => example(), ['--scenario', 'Base case'], /--scenario applies only to a project file/],
    ['given --scenario with no name', () => projectFileText(), ['--scenario'], /--scenario needs a scenario name/],
  ];
  for (const [name, make, extra, pattern] of notReady) {
    it(`exits 2 with one line for a project ${name}`, () => {
      const r = analyse(writeCase(`project-${name.replace(/\s+/g, '-')}`, make()), '--json', ...extra);
      expect(r.code).toBe(2);
      expect(r.stdout).toBe('');
      const lines = r.stderr.split('\n').filter((l) => l.trim() !== '');
      expect(lines).toHaveLength(1);
      expect(lines[0]).toMatch(pattern);
    }, T);
  }
});

describe('analyse FILE (table)', () => {
  it('prints a readable table with the horizons and the detachment', () => {
    const r = analyse(join(fixtures, 'method-example.json'));
    expect(r.code).toBe(0);
    // Areas in one unit for the table: 2.5 km² for H1 (src/format/formatQuantity.ts areaUnit).
    expect(r.stdout).toMatch(/^Horizon\s+In fit\s+Excess area \(km²\)/m);
    expect(r.stdout).toMatch(/^H1\s+yes\s+2\.5\s/m);
    expect(r.stdout).toContain('Detachment depth 3000 m below the reference');
  }, T);
});

describe('analyse FILE with bad input: exit code 2 and one line on stderr', () => {
  const bad: [string, () => unknown, RegExp][] = [
    ['not JSON', () => '{ "units": ', /not valid JSON/],
    ['empty section', () => ({ ...example(), horizons: [] }), /no horizons/],
    ['too few points', () => { const s = example(); s.horizons[0].line = [[0, 0]]; return s; }, /Horizon "H1".*1 point/],
    ['misses a pin', () => { const s = example(); s.horizons[1].line = [[100, 0], [10000, -1000]]; return s; }, /Horizon "H2".*does not reach the left pin/],
    ['crosses a pin twice', () => { const s = example(); s.horizons[0].line = [[-10, -500], [100, -400], [-20, -300], [5000, 0], [10000, -500]]; return s; }, /Horizon "H1".*left pin \(x = 0\) 3 times/],
    ['self-intersecting', () => { const s = example(); s.horizons[0].line = [[0, -500], [6000, -500], [6000, 0], [4000, -600], [10000, -500]]; return s; }, /Horizon "H1".*crosses itself between the pins \(segments 0–1 and 2–3 cross at x ≈ 4333\.33 m\)/],
    ['not finite', () => JSON.stringify(example()).replace('-500', '1e999'), /not a finite number/],
    ['pins equal', () => ({ ...example(), pins: [5, 5] }), /both pins/],
    ['pins reversed', () => ({ ...example(), pins: [10000, 0] }), /reversed/],
    ['duplicate names', () => { const s = example(); s.horizons[1].name = 'H1'; return s; }, /"H1" appears more than once/],
    ['bad projected run', () => { const s = example(); s.horizons[0].projected = [[2, 1]]; return s; }, /projected run/],
    ['bad units', () => ({ ...example(), units: 'km' }), /"units" must be "m" or "ft"/],
    ['bad shape', () => [1, 2, 3], /must be a JSON object/],
  ];
  for (const [name, make, pattern] of bad) {
    it(`rejects ${name}`, () => {
      const r = analyse(writeCase(name.replace(/\s+/g, '-'), make()), '--json');
      expect(r.code).toBe(2);
      expect(r.stdout).toBe('');
      const lines = r.stderr.split('\n').filter((l) => l.trim() !== '');
      expect(lines).toHaveLength(1);
      expect(lines[0]).toMatch(pattern);
      expect(lines[0]).not.toMatch(/\bat .*\.ts:\d+/);
    }, T);
  }

  it('rejects a missing file and a missing argument', () => {
    for (const r of [analyse(join(tmp, 'nope.json')), analyse()]) {
      expect(r.code).toBe(2);
      expect(r.stderr.trim().split('\n')).toHaveLength(1);
    }
  }, T);
});
