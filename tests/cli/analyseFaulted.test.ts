import { spawnSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { faultedSection, type FaultedSpec } from '../../src/core/forward/faultedSection';
import type { XZ } from '../../src/core/model/section';

// The command line on faulted and extensional sections, run as a user runs it. The sections come from
// the faulted forward model (vertical simple shear, Gibbs 1983; exact areas D·(z_r − zd), our
// derivation), so the printed D and zd must be the model's to rounding.
const root = join(import.meta.dirname, '..', '..');
const tmp = mkdtempSync(join(tmpdir(), 'foldroot-cli-faults-'));
const T = 60_000;

function analyse(...args: string[]) {
  const r = spawnSync('npx', ['tsx', 'src/cli/analyse.ts', ...args], { cwd: root, encoding: 'utf8' });
  return { code: r.status, stdout: r.stdout, stderr: r.stderr };
}

function writeCase(name: string, content: unknown): string {
  const file = join(tmp, `${name}.json`);
  writeFileSync(file, JSON.stringify(content));
  return file;
}

const fault: XZ[] = [[-8000, -3000], [6000, -3000], [8000, -1800], [9000, -600], [10500, 800], [30000, 800]];
const spec = (D: number): FaultedSpec => ({
  units: 'm', pins: [0, 20000], displacement: D, fault, faultName: 'Main thrust',
  horizons: [500, -500, -1500, -2500].map((r, i) => ({ name: `L${i}`, regionalElevation: r })),
});

describe('analyse FILE --json on faulted sections', () => {
  it('returns the thrust model\'s D and zd, with pieces and cutoffs per horizon and the regime', () => {
    const { section, truth } = faultedSection(spec(1500));
    const r = analyse(writeCase('thrust', section), '--json');
    expect(r.stderr).toBe('');
    expect(r.code).toBe(0);
    const j = JSON.parse(r.stdout);
    expect(j.regime).toBe('shortening');
    expect(Math.abs(j.areaDepth.displacement - 1500)).toBeLessThan(1e-9 * 1500);
    expect(Math.abs(j.areaDepth.detachmentElevation - truth.detachmentElevation)).toBeLessThan(1e-9 * 3000);
    expect(j.horizons.map((h: { pieces: number }) => h.pieces)).toEqual([2, 2, 2, 2]);
    const c = j.horizons[0].cutoffs[0];
    expect(Object.keys(c)).toEqual(['fault', 'from', 'to', 'slip', 'heave', 'throw']);
    expect(c.fault).toBe('Main thrust');
    expect(c.from).toEqual(truth.horizons[0].hangingWallCutoff);
    expect(c.to).toEqual(truth.horizons[0].footwallCutoff);
    expect(Math.abs(c.heave - 1500)).toBeLessThan(1e-9);
  }, T);

  it('gives an extensional section a non-null areaDepth with displacement < 0 and the regime "extension"', () => {
    const { section } = faultedSection(spec(-1200));
    const r = analyse(writeCase('normal', section), '--json');
    expect(r.code).toBe(0);
    const j = JSON.parse(r.stdout);
    expect(j.regime).toBe('extension');
    expect(j.areaDepth).not.toBeNull();
    expect(Math.abs(j.areaDepth.displacement + 1200)).toBeLessThan(1e-9 * 1200);
    expect(Math.abs(j.areaDepth.detachmentElevation + 3000)).toBeLessThan(1e-9 * 3000);
    const table = analyse(writeCase('normal-table', section));
    expect(table.stdout).toContain('Displacement D = -1200 m (95%: -1200 to -1200), extension (1200 m)');
  }, T);
});

describe('analyse: each bad faulted input exits 2 with one line naming the horizon or fault', () => {
  const base = () => faultedSection(spec(1500)).section;
  const cases: [string, (s: ReturnType<typeof base>) => unknown, RegExp][] = [
    ['both line and pieces', (s) => { s.horizons[0].line = [[0, 0], [1, 0]]; return s; }, /Horizon "L0" has both "line" and "pieces"/],
    ['a piece with one point', (s) => { s.horizons[1].pieces![1] = [[9000, -600]]; return s; }, /Horizon "L1": piece 2 has 1 point/],
    ['pieces not ending on one fault', (s) => { s.horizons[2].pieces![1][0] = [s.horizons[2].pieces![1][0][0], s.horizons[2].pieces![1][0][1] - 50]; return s; }, /Horizon "L2": the end of piece 1 .* do not both lie on one common fault/],
    ['a fault with one point', (s) => { s.faults!.push({ name: 'Stub', line: [[1, 1]] }); return s; }, /Fault "Stub": line has 1 point/],
    ['a fault that crosses itself', (s) => { s.faults!.push({ name: 'Loop', line: [[0, 0], [2, 2], [2, 0], [0, 2]] }); return s; }, /Fault "Loop": the line crosses itself/],
    ['a duplicate fault name', (s) => { s.faults!.push({ ...s.faults![0] }); return s; }, /Fault "Main thrust" appears more than once/],
    ['an unknown fault name', (s) => { s.horizons[3].joinFaults = ['Back thrust']; return s; }, /Horizon "L3": the join after piece 1 names fault "Back thrust"/],
    ['a joined line that crosses itself', (s) => {
      // The footwall piece climbs over the hanging wall before running on.
      const fw = s.horizons[0].pieces![1];
      s.horizons[0].pieces![1] = [fw[0], [9800, 2500], fw[1]];
      return s;
    }, /Horizon "L0": the joined line \(its pieces and the fault between them\) crosses itself/],
  ];
  for (const [label, make, message] of cases) {
    it(label, () => {
      const r = analyse(writeCase(label.replace(/\W+/g, '-'), make(base())), '--json');
      expect(r.code).toBe(2);
      expect(r.stdout).toBe('');
      expect(r.stderr.trimEnd().split('\n')).toHaveLength(1);
      expect(r.stderr).toMatch(message);
    }, T);
  }
});
