// The lint rule against spreading a list into a call (eslint.config.js): it must flag the three forms
// that overflow the call stack on long lists and leave loops and array literals alone.
import { describe, expect, it } from 'vitest';
import { ESLint } from 'eslint';

async function messages(code: string, file = 'src/core/stats/example.ts'): Promise<string[]> {
  const eslint = new ESLint({ cwd: process.cwd() });
  const [result] = await eslint.lintText(code, { filePath: file });
  return result.messages.filter((m) => m.ruleId === 'no-restricted-syntax').map((m) => m.message);
}

describe('lint: no spread of a list into a call', () => {
  it('flags Math.min(...xs), Math.max(0, ...xs), out.push(...xs) and Math.max.apply(null, xs), in src and tests', async () => {
    const code = 'export function f(xs: number[], out: number[]) {\n  out.push(...xs);\n  return Math.min(...xs) + Math.max(0, ...xs) + Math.max.apply(null, xs);\n}\n';
    expect(await messages(code)).toHaveLength(4);
    expect(await messages(code, 'tests/core/example.test.ts')).toHaveLength(4);
  }, 60_000);

  it('leaves loops, array literals and spreads into other calls alone', async () => {
    const code = 'export function g(xs: number[]) {\n  let m = Infinity;\n  for (const x of xs) m = Math.min(m, x);\n  const ys = [0, ...xs];\n  return [m, ys, new Set([...xs])];\n}\n';
    expect(await messages(code)).toEqual([]);
  }, 60_000);

  it('flags in src every other spread into a call or constructor, and an array literal\'s spread not', async () => {
    const code = 'export function h(xs: number[], f: (...a: number[]) => number) {\n  const d = new Date(...(xs as [number]));\n  return [f(...xs), String.fromCharCode(...xs), d, [...xs]];\n}\n';
    const found = await messages(code, 'src/io/example.ts');
    expect(found).toHaveLength(3);
    expect(found.every((m) => m.includes('puts every element on the call stack'))).toBe(true);
    // Outside src (tests, scripts) only the known forms are banned.
    expect(await messages(code, 'tests/io/example.test.ts')).toEqual([]);
  }, 60_000);
});
