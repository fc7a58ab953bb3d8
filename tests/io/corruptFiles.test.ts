// Seeded corrupt and hostile files (fast-check, seed printed on failure): the parsers never throw,
// and opening a bad file never changes the open project.
import fc from 'fast-check';
import { beforeEach, describe, expect, it, vi } from 'vitest';
import { checkProjectDoc } from '../../src/core/model/projectSchema';
import { parseHorizonsCsv, writeHorizonsCsv } from '../../src/io/csvHorizons';
import { parseProjectText, serializeProject } from '../../src/io/projectFile';
import { useDocStore } from '../../src/state/docStore';
import { sampleDoc } from './sampleDoc';

// The real decoder needs browser image APIs; here every embedded scan is "undecodable".
vi.mock('../../src/io/decodeScan', () => ({ decodeScan: async () => ({ ok: false, message: 'cannot decode in tests' }) }));
const { openProjectFile } = await import('../../src/state/projectActions');

const SEED = 20240501;
const HOSTILE = ['<img src=x onerror=alert(1)>', '"><script>alert(1)</script>', '__proto__', 'constructor', '\u0000\u202e', '=cmd|"/c calc"!A1', 'a'.repeat(10_000)];

const good = serializeProject(sampleDoc(), { type: 'image/png', name: 'scan.png', bytes: Uint8Array.from([137, 80, 78, 71, 13, 10, 26, 10, 1, 2, 3]) });
const goodNoScan = serializeProject(sampleDoc(), null);

function setAt(value: unknown, path: number[], replacement: unknown): unknown {
  if (path.length === 0 || typeof value !== 'object' || value === null) return replacement;
  const keys = Object.keys(value);
  if (keys.length === 0) return replacement;
  const key = keys[path[0] % keys.length];
  const copy: Record<string, unknown> = Array.isArray(value) ? [...value] as unknown as Record<string, unknown> : { ...value };
  copy[key] = setAt((value as Record<string, unknown>)[key], path.slice(1), replacement);
  return copy;
}

const junk = fc.oneof(fc.constantFrom(...HOSTILE), fc.double(), fc.constantFrom(1e308, -1e308, Number.MAX_SAFE_INTEGER * 1e10), fc.boolean(), fc.constant(null), fc.constant([]), fc.constant({}), fc.string());

/** Corrupt project texts: truncated, bytes flipped, a value replaced by a wrong type, deep nesting, huge numbers. */
const corruptProject = fc.oneof(
  fc.nat().map((n) => good.slice(0, n % good.length)),
  fc.array(fc.tuple(fc.nat(), fc.integer({ min: 1, max: 255 })), { minLength: 1, maxLength: 8 }).map((flips) => {
    const chars = good.split('');
    for (const [at, x] of flips) chars[at % chars.length] = String.fromCharCode(chars[at % chars.length].charCodeAt(0) ^ x);
    return chars.join('');
  }),
  fc.tuple(fc.array(fc.nat(), { minLength: 1, maxLength: 7 }), junk).map(([path, v]) => JSON.stringify(setAt(JSON.parse(goodNoScan), path, v))),
  fc.integer({ min: 1000, max: 200_000 }).map((d) => '['.repeat(d) + ']'.repeat(d)),
  fc.integer({ min: 1000, max: 50_000 }).map((d) => goodNoScan.replace('"horizons":', `"horizons":${'['.repeat(d)}${']'.repeat(d)},"x":`)),
  fc.constant(goodNoScan.replace(/"pointsPx":\[\[[^\]]*\]/, '"pointsPx":[[1e400,2]')),
);

describe('corrupt project files', () => {
  beforeEach(() => useDocStore.getState().replace(sampleDoc()));

  it('parseProjectText never throws and anything it opens passes the schema (200 seeded cases)', () => {
    fc.assert(
      fc.property(corruptProject, (text) => {
        const r = parseProjectText(text, 'fuzz.json');
        if (r.ok) expect(checkProjectDoc(r.doc).ok).toBe(true);
        else expect(r.message.length).toBeGreaterThan(0);
      }),
      { seed: SEED, numRuns: 200 },
    );
  });

  it('opening a corrupt file through openProjectFile leaves the open project untouched (200 seeded cases)', async () => {
    await fc.assert(
      fc.asyncProperty(corruptProject, async (text) => {
        const before = useDocStore.getState();
        const opened = await openProjectFile(new File([text], 'fuzz.json'));
        const after = useDocStore.getState();
        if (!opened) {
          expect(after.doc).toBe(before.doc);
          expect(after.revision).toBe(before.revision);
        } else expect(checkProjectDoc(after.doc).ok).toBe(true);
      }),
      { seed: SEED, numRuns: 200 },
    );
  });

  it('a valid file with hostile names opens with the names kept verbatim as data', async () => {
    const doc = sampleDoc();
    doc.horizons.forEach((h, i) => (h.name = HOSTILE[i]));
    doc.title = HOSTILE[0];
    expect(await openProjectFile(new File([serializeProject(doc, null)], 'hostile.json'))).toBe(true);
    expect(useDocStore.getState().doc.horizons.map((h) => h.name)).toEqual(HOSTILE.slice(0, 3));
    expect(Object.getPrototypeOf(useDocStore.getState().doc.scenarios[0].regionals)).toBe(Object.prototype);
  });
});

describe('corrupt CSV files', () => {
  const csv = writeHorizonsCsv([{ name: 'Top', line: [[0, 1], [2, 3], [4, 5]] }, { name: HOSTILE[0], line: [[0, -1], [9, -2]] }], 'm');
  const corruptCsv = fc.oneof(
    fc.nat().map((n) => csv.slice(0, n % csv.length)),
    fc.array(fc.tuple(fc.nat(), fc.integer({ min: 1, max: 255 })), { minLength: 1, maxLength: 8 }).map((flips) => {
      const chars = csv.split('');
      for (const [at, x] of flips) chars[at % chars.length] = String.fromCharCode(chars[at % chars.length].charCodeAt(0) ^ x);
      return chars.join('');
    }),
    fc.array(fc.tuple(junk.map(String), fc.oneof(fc.double().map(String), fc.string(), fc.constant('1e999')), fc.string()), { maxLength: 30 })
      .map((rows) => ['horizon,x,z', ...rows.map((r) => r.join(','))].join('\n')),
    fc.integer({ min: 1, max: 20_000 }).map((n) => 'horizon,x,z\n' + '"'.repeat(n)),
  );

  it('parseHorizonsCsv never throws; what it returns is usable (200 seeded cases)', () => {
    fc.assert(
      fc.property(corruptCsv, (text) => {
        const r = parseHorizonsCsv(text);
        if (!r.ok) expect(r.message.length).toBeGreaterThan(0);
        else {
          for (const h of r.horizons) {
            expect(h.line.length).toBeGreaterThanOrEqual(2);
            expect(h.line.flat().every(Number.isFinite)).toBe(true);
          }
        }
      }),
      { seed: SEED, numRuns: 200 },
    );
  });
});
