import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, truncateSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { LIMITS } from '../../src/core/model/limits';
import { terminalText } from '../../src/cli/terminalText';

// What the command line does with input that would harm a terminal or never end, run as a user runs it.
const root = join(import.meta.dirname, '..', '..');
const tmp = mkdtempSync(join(tmpdir(), 'foldroot-cli-safety-'));
const T = 60_000;
const example = () => JSON.parse(readFileSync(join(root, 'tests', 'fixtures', 'sections', 'method-example.json'), 'utf8'));

function analyse(...args: string[]) {
  const r = spawnSync('npx', ['tsx', 'src/cli/analyse.ts', ...args], { cwd: root, encoding: 'utf8' });
  return { code: r.status, stdout: r.stdout, stderr: r.stderr };
}

describe('terminalText', () => {
  it('terminalText(name) shows ESC, other C0/C1 controls and DEL as \\xNN and leaves other text alone', () => {
    // ECMA-48: ESC (0x1b) starts control sequences such as "ESC [ 2 J" (clear screen); 0x9b is the C1 CSI.
    expect(terminalText('\u001b[2JTop marker')).toBe('\\x1b[2JTop marker');
    expect(terminalText('a\tb\nc\u007fd\u009be')).toBe('a\\x09b\\x0ac\\x7fd\\x9be');
    expect(terminalText('Grès à nummulites − 2')).toBe('Grès à nummulites − 2');
  });
});

describe('analyse on hostile input', () => {
  it('analyse FILE shows a horizon name with escape sequences escaped in the table and in messages', () => {
    const s = example();
    s.horizons[0].name = '\u001b[31mred\u001b[0m';
    const file = join(tmp, 'escapes.json');
    writeFileSync(file, JSON.stringify(s));
    const r = analyse(file);
    expect(r.code).toBe(0);
    expect(r.stdout).not.toContain('\u001b');
    expect(r.stdout).toContain('\\x1b[31mred\\x1b[0m');
    // A message that names the horizon is escaped too.
    s.horizons[0].line = [[0, 0]];
    writeFileSync(file, JSON.stringify(s));
    const bad = analyse(file);
    expect(bad.code).toBe(2);
    expect(bad.stderr).not.toContain('\u001b');
  }, T);

  it('analyse FILE refuses a file over the size limit before reading it, naming both sizes', () => {
    const file = join(tmp, 'huge.json');
    writeFileSync(file, '');
    // A sparse file: its size is reported at once, nothing is written to disk.
    truncateSync(file, LIMITS.fileBytes + 100 * 1024 * 1024);
    const r = analyse(file);
    expect(r.code).toBe(2);
    expect(r.stderr.trim().split('\n')).toHaveLength(1);
    expect(r.stderr).toContain(`file too large (600 MB; the limit is 500 MB)`);
  }, T);

  it('analyse /dev/zero is refused as not a regular file instead of reading forever', () => {
    const r = analyse('/dev/zero');
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/not a regular file/);
  }, T);

  it('analyse FILE | head ends quietly when the reader stops early (no EPIPE trace)', () => {
    // Enough horizons that the table outgrows a pipe's buffer (64 KiB on Linux), so writing meets a closed pipe.
    const s = example();
    const h0 = s.horizons[0];
    s.horizons = Array.from({ length: 1500 }, (_, i) => ({ ...h0, name: `Horizon ${i + 1}` }));
    const file = join(tmp, 'many.json');
    writeFileSync(file, JSON.stringify(s));
    const r = spawnSync('bash', ['-c', `npx tsx src/cli/analyse.ts '${file}' | head -c 100 > /dev/null`], { cwd: root, encoding: 'utf8' });
    expect(r.status).toBe(0);
    expect(r.stderr).not.toMatch(/EPIPE|Error/);
  }, T);
});
