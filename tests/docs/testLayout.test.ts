// A module's tests sit at its mirrored path: tests/<folder>/<module>.test.ts(x) for src/<folder>/<module>.ts(x)
// (a suffix such as <module>.properties.test.ts is allowed). A test named after a module but filed in another
// folder is the drift this guards against: a reader looking beside the module's path would not find it.
import { readdirSync, statSync } from 'node:fs';
import { join, relative } from 'node:path';
import { describe, expect, it } from 'vitest';

const root = join(import.meta.dirname, '..', '..');

function filesUnder(dir: string): string[] {
  const out: string[] = [];
  for (const name of readdirSync(dir)) {
    if (name === 'node_modules' || name === 'fixtures') continue;
    const path = join(dir, name);
    if (statSync(path).isDirectory()) for (const f of filesUnder(path)) out.push(f);
    else out.push(path);
  }
  return out;
}

const modules = filesUnder(join(root, 'src'))
  .filter((f) => /\.tsx?$/.test(f) && !f.endsWith('.d.ts'))
  .map((f) => relative(join(root, 'src'), f).replace(/\.tsx?$/, ''));
const tests = filesUnder(join(root, 'tests'))
  .filter((f) => /\.test\.tsx?$/.test(f))
  .map((f) => relative(join(root, 'tests'), f));

/** The folder a test's module would be in, or null when no module has the test's name. */
function misplaced(test: string): string | null {
  const folder = test.includes('/') ? test.slice(0, test.lastIndexOf('/')) : '';
  const stem = test.slice(test.lastIndexOf('/') + 1).split('.')[0];
  const homes = modules.filter((m) => m.slice(m.lastIndexOf('/') + 1) === stem).map((m) => (m.includes('/') ? m.slice(0, m.lastIndexOf('/')) : ''));
  if (homes.length === 0 || homes.includes(folder)) return null;
  return `tests/${test} tests src/${homes[0]}/${stem}: move it to tests/${homes[0]}/`;
}

describe('tests sit at the mirrored path of the module they are named after', () => {
  it('finds the modules and the tests it checks', () => {
    expect(modules.length).toBeGreaterThan(100);
    expect(tests.length).toBeGreaterThan(100);
  });

  it('has no test named after a module but filed elsewhere', () => {
    expect(tests.map(misplaced).filter((m) => m !== null)).toEqual([]);
  });

  it('would report a test filed away from its module (the check itself can fail)', () => {
    expect(misplaced('io/files/csvHorizons.test.ts')).toMatch(/move it to tests\/io\//);
    expect(misplaced('io/csvHorizons.test.ts')).toBeNull();
    expect(misplaced('io/somethingWithoutAModule.test.ts')).toBeNull();
  });
});
