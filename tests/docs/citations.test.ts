// The repository stands on its own: every "<file>.md §Heading" citation in the code, tests, scripts and
// notes names a document in the repository and one of its headings, and nothing cites a document that
// is not here. Headings are matched as the longest heading the cited text starts with.
import { readdirSync, readFileSync, statSync, existsSync } from 'node:fs';
import { join, relative } from 'node:path';
import { describe, expect, it } from 'vitest';

const root = join(__dirname, '..', '..');
const scanned = ['src', 'tests', 'scripts', 'docs', '.ci', 'README.md', 'DEVELOPERS.md'];

function filesUnder(path: string): string[] {
  if (!existsSync(path)) return [];
  if (statSync(path).isFile()) return [path];
  const out: string[] = [];
  for (const name of readdirSync(path)) {
    if (name === 'node_modules' || name === 'fixtures') continue;
    for (const f of filesUnder(join(path, name))) out.push(f);
  }
  return out;
}

const files = scanned.flatMap((p) => filesUnder(join(root, p))).filter((f) => /\.(ts|tsx|mjs|js|md|css|sh)$|run$/.test(f));

function headingsOf(doc: string): string[] {
  return readFileSync(doc, 'utf8').split('\n').filter((l) => /^#{2,4} /.test(l)).map((l) => l.replace(/^#+ /, '').trim());
}

/** Resolves a cited document name the way a reader would: from the repository root, else beside the citing file. */
function resolveDoc(name: string, from: string): string | null {
  for (const candidate of [join(root, name), join(from, '..', name)]) if (existsSync(candidate)) return candidate;
  return null;
}

describe('citations of the repository\'s own documents', () => {
  it('every "<doc>.md §Heading" names an existing document and one of its headings', () => {
    const bad: string[] = [];
    let count = 0;
    for (const file of files) {
      const text = readFileSync(file, 'utf8');
      for (const m of text.matchAll(/([\w./-]+\.md),? §([^\n]*)/g)) {
        count++;
        const doc = resolveDoc(m[1], file);
        const where = `${relative(root, file)}: ${m[0].slice(0, 80)}`;
        if (!doc) { bad.push(`${where} (no such document)`); continue; }
        const cited = m[2].replace(/^["“]/, '');
        if (!headingsOf(doc).some((h) => cited.startsWith(h))) bad.push(`${where} (no such heading)`);
      }
    }
    expect(bad).toEqual([]);
    expect(count).toBeGreaterThan(50);
  });

  it('nothing cites the team\'s outside notes, issue numbers, review items or paths on the team\'s machine', () => {
    // Built from parts so that this file does not match itself.
    const outside = new RegExp(['MET' + 'HOD\\.md', 'STY' + 'LE\\.md', 'RUL' + 'ES\\.md', 'iss' + 'ue[ -]\\d', 'the iss' + 'ue asks', 'iss' + 'ue "', '\\.\\./sha' + 'red', 'rev' + 'iew #\\d', 'jour' + 'ney P\\d', '/wo' + 'rk/'].join('|'));
    const hits = files.filter((f) => !f.endsWith('citations.test.ts')).filter((f) => outside.test(readFileSync(f, 'utf8')));
    expect(hits.map((f) => relative(root, f))).toEqual([]);
  });
});
