// The declared Node range: its reading follows npm's semver rules for "^" and ">=" (npm documentation of
// node-semver: "^1.2.3 := >=1.2.3 <2.0.0-0"), it admits the Node that CI runs, and every version it admits
// is also admitted by each dependency that declares a Node range (so installs do not warn).
import { readFileSync, existsSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { declaredNodeRange, satisfiesNodeRange } from '../../scripts/nodeRange.mjs';

const root = join(__dirname, '..', '..');
const pkg = JSON.parse(readFileSync(join(root, 'package.json'), 'utf8'));

describe('satisfiesNodeRange(version, range)', () => {
  it('reads "^" as the same major at or above the version, and ">=" as at or above (npm semver)', () => {
    expect(satisfiesNodeRange('v20.19.0', '^20.19.0')).toBe(true);
    expect(satisfiesNodeRange('v20.18.9', '^20.19.0')).toBe(false);
    expect(satisfiesNodeRange('v21.0.0', '^20.19.0')).toBe(false);
    expect(satisfiesNodeRange('v24.0.0', '>=24')).toBe(true);
    expect(satisfiesNodeRange('v23.99.0', '>=24')).toBe(false);
    expect(satisfiesNodeRange('v22.13.0', '^20.19.0 || ^22.13.0')).toBe(true);
    expect(satisfiesNodeRange('v22.12.9', '^20.19.0 || ^22.13.0')).toBe(false);
  });
});

describe('the declared Node range (package.json engines.node)', () => {
  const range = declaredNodeRange(join(root, 'package.json'));

  it('admits the Node 20.20 that the machine and CI run', () => {
    expect(satisfiesNodeRange('v20.20.0', range)).toBe(true);
  });

  it('admits no version that a dependency declaring a Node range refuses', () => {
    const deps = Object.keys({ ...pkg.dependencies, ...pkg.devDependencies });
    const ranges = deps
      .map((d) => join(root, 'node_modules', d, 'package.json'))
      .filter((p) => existsSync(p))
      .map((p) => JSON.parse(readFileSync(p, 'utf8')) as { name: string; engines?: { node?: string } })
      .filter((p) => p.engines?.node && /^[\s\d.^>=|v]+$/.test(p.engines.node));
    expect(ranges.length).toBeGreaterThan(5);
    const refused: string[] = [];
    for (let major = 18; major <= 26; major++) {
      for (let minor = 0; minor <= 30; minor++) {
        const v = `v${major}.${minor}.0`;
        if (!satisfiesNodeRange(v, range)) continue;
        for (const p of ranges) if (!satisfiesNodeRange(v, p.engines!.node!)) refused.push(`${p.name} refuses ${v}`);
      }
    }
    expect(refused).toEqual([]);
  });
});
