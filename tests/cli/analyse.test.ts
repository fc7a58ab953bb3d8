import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';

// The command line run as a user runs it: `npx tsx src/cli/analyse.ts FILE [--json]`.
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
  it('prints exactly the issue-3 shape for the METHOD.md synthetic example', () => {
    // Source: METHOD.md synthetic example: slope −1000 m, intercept 3 km², zd = 3000 m.
    const r = analyse(join(fixtures, 'method-example.json'), '--json');
    expect(r.code).toBe(0);
    const j = JSON.parse(r.stdout);
    expect(Object.keys(j)).toEqual(['pinWidth', 'referenceElevation', 'horizons', 'areaDepth', 'notes']);
    expect(Object.keys(j.horizons[0])).toEqual(['name', 'excessArea', 'bedLength', 'regionalLength', 'regionalElevation', 'depth', 'chamberlinDepth', 'lpsStrain', 'included']);
    expect(Object.keys(j.areaDepth)).toEqual(['n', 'slope', 'intercept', 'displacement', 'detachmentDepth', 'detachmentElevation', 'r2', 'detachmentDepthCI95', 'displacementCI95']);
    expect(j.horizons.map((h: { name: string }) => h.name)).toEqual(['H1', 'H2', 'H3', 'H4']);
    expect(j.areaDepth.slope).toBeCloseTo(-1000, 6);
    expect(j.areaDepth.intercept).toBeCloseTo(3e6, 3);
    expect(j.areaDepth.detachmentDepth).toBeCloseTo(3000, 6);
    expect(j.areaDepth.detachmentElevation).toBeCloseTo(-3000, 6);
    expect(j.notes.some((n: string) => n.includes('licensed professional'))).toBe(true);
  }, T);

  it('accepts a project file that embeds the section under "section"', () => {
    const a = analyse(join(fixtures, 'project-embedded.json'), '--json');
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

describe('analyse FILE (table)', () => {
  it('prints a readable table with the horizons and the detachment', () => {
    const r = analyse(join(fixtures, 'method-example.json'));
    expect(r.code).toBe(0);
    expect(r.stdout).toMatch(/^H1\s+yes\s+2500000/m);
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
    ['self-intersecting', () => { const s = example(); s.horizons[0].line = [[0, -500], [6000, -500], [6000, 0], [4000, -600], [10000, -500]]; return s; }, /Horizon "H1".*crosses itself/],
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
