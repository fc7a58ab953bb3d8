import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { jsonDepth } from '../../src/core/model/jsonDepthProblem';

// Input that is valid JSON but not a section Foldroot can measure, run through the command line as a
// user runs it: exit code 2 and one line that says what is wrong (src/cli/README.md, the exit contract).
const root = join(import.meta.dirname, '..', '..');
const tmp = mkdtempSync(join(tmpdir(), 'foldroot-cli-hostile-'));
const T = 60_000;
const example = () => JSON.parse(readFileSync(join(root, 'tests', 'fixtures', 'sections', 'method-example.json'), 'utf8'));

function analyse(name: string, text: string) {
  const file = join(tmp, name);
  writeFileSync(file, text);
  const r = spawnSync('npx', ['tsx', 'src/cli/analyse.ts', file], { cwd: root, encoding: 'utf8' });
  return { code: r.status, stdout: r.stdout, stderr: r.stderr };
}

function oneLine(stderr: string): string {
  const lines = stderr.trimEnd().split('\n');
  expect(lines).toHaveLength(1);
  return lines[0];
}

describe('analyse refuses what it cannot measure, with exit 2 and one line', () => {
  it('coordinates of 1e160 and 1e308 are refused as outside the range, not analysed to nulls', () => {
    for (const big of [1e160, -1e308, 2e12]) {
      const s = example();
      s.horizons[0].line[1][1] = big;
      const r = analyse('far.json', JSON.stringify(s));
      expect(r.code).toBe(2);
      expect(r.stdout).toBe('');
      expect(oneLine(r.stderr)).toContain('a coordinate is outside the range Foldroot computes in');
    }
  }, T);

  it('a section of about 1e-300 units is refused as too small to measure, not given a bed length of 0', () => {
    const s = { units: 'm', pins: [1e-300, 3e-300], horizons: [{ name: 'A', line: [[0, -1e-300], [2e-300, -2e-300], [4e-300, -1e-300]], regional: [[0, -1e-300], [4e-300, -1e-300]] }] };
    const r = analyse('tiny.json', JSON.stringify(s));
    expect(r.code).toBe(2);
    expect(oneLine(r.stderr)).toContain('the section is too small to measure');
  }, T);

  it('100,000 levels of nesting get a named message, not "Maximum call stack size exceeded"', () => {
    const n = 100_000;
    for (const text of ['['.repeat(n) + ']'.repeat(n), `{"format":"foldroot-project","version":1,"doc":${'{"a":'.repeat(n)}1${'}'.repeat(n)}}`]) {
      const r = analyse('deep.json', text);
      expect(r.code).toBe(2);
      const line = oneLine(r.stderr);
      expect(line).toContain(`the file is nested too deeply (${jsonDepth(text).toLocaleString('en-US')} levels`);
      expect(line).not.toContain('call stack');
    }
  }, T);

  it('a typo in a project file\'s "format" field names that field, not "units"', () => {
    const r = analyse('typo.json', JSON.stringify({ format: 'foldroot-projet', version: 1, doc: {} }));
    expect(r.code).toBe(2);
    const line = oneLine(r.stderr);
    expect(line).toContain('the "format" field is "foldroot-projet", not "foldroot-project"');
    expect(line).not.toContain('units');
  }, T);
});

describe('jsonDepth', () => {
  it('counts arrays and objects, skips brackets inside strings (with escaped quotes)', () => {
    // Depths counted by hand from the JSON grammar (RFC 8259): a string's contents are not structure.
    expect(jsonDepth('1')).toBe(0);
    expect(jsonDepth('[[1],{"a":[2]}]')).toBe(3);
    expect(jsonDepth('{"a":"[[[\\"{{{"}')).toBe(1);
  });
});
