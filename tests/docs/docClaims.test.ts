// The documents' checkable claims are true of the code as it is: every file or folder a README, DEVELOPERS.md
// or docs/ page names in backticks exists, every `npm run …` names a script in package.json, and every code
// name in backticks (camelCase, as `analyseSection` or `beginGesture()`) occurs in the code. Prose claims
// still need a reader; these are the ones a machine can keep true.
import { existsSync, readdirSync, readFileSync, statSync } from 'node:fs';
import { basename, dirname, join } from 'node:path';
import { describe, expect, it } from 'vitest';

const root = join(__dirname, '..', '..');

function filesUnder(path: string): string[] {
  if (!existsSync(path)) return [];
  if (statSync(path).isFile()) return [path];
  const out: string[] = [];
  for (const name of readdirSync(path)) {
    if (name === 'node_modules' || name === 'dist' || name.startsWith('.git')) continue;
    for (const f of filesUnder(join(path, name))) out.push(f);
  }
  return out;
}

const docs = [
  'README.md',
  'DEVELOPERS.md',
  ...readdirSync(join(root, 'docs')).filter((f) => f.endsWith('.md')).map((f) => `docs/${f}`),
  ...readdirSync(join(root, 'src')).filter((d) => existsSync(join(root, 'src', d, 'README.md'))).map((d) => `src/${d}/README.md`),
];
const repoFiles = ['src', 'scripts', 'tests', 'public', 'docs', '.ci'].flatMap((p) => filesUnder(join(root, p)));
const fileNames = new Set(repoFiles.map((f) => basename(f)));
const codeText = repoFiles
  .filter((f) => /\.(ts|tsx|mjs|js|sh|css|html)$|run$/.test(f))
  .concat(['package.json', 'index.html', 'vite.config.ts', 'playwright.config.ts'].map((f) => join(root, f)).filter(existsSync))
  .map((f) => readFileSync(f, 'utf8'))
  .join('\n');
const scripts = new Set(Object.keys((JSON.parse(readFileSync(join(root, 'package.json'), 'utf8')) as { scripts: Record<string, string> }).scripts));

const PATH = /^(?:[\w.@-]+\/)*[\w.@-]+\.(?:ts|tsx|md|json|mjs|js|css|html|sh|png|csv|svg|geojson|tif|tiff|txt)$|^[\w.-]+(?:\/[\w.-]+)+\/?$/;
const NPM = /^npm (?:run )?(?:--?[\w-]+ )*([\w:-]+)/;
const SYMBOL = /^([a-z][a-zA-Z0-9]*[A-Z][a-zA-Z0-9]*)(?:\(.*\))?$/;

/** Returns the claims of one document that the repository does not bear out, each as "doc: what". */
function falseClaims(doc: string, text: string, exists: (candidate: string) => boolean): string[] {
  const bad: string[] = [];
  for (const m of text.matchAll(/`([^`\n]+)`/g)) {
    const s = m[1].trim();
    if (PATH.test(s)) {
      const bare = s.replace(/\/$/, '');
      const candidates = [bare, `src/${bare}`, join(dirname(doc), bare), `tests/${bare}`, `scripts/${bare}`, `public/${bare}`];
      const withExt = candidates.flatMap((c) => [c, `${c}.ts`, `${c}.tsx`]);
      const found = withExt.some(exists) || (!bare.includes('/') && fileNames.has(bare)) || (bare.startsWith('pdfjs/') && codeText.includes(bare));
      if (!found) bad.push(`${doc}: no file or folder ${s}`);
      continue;
    }
    const npm = NPM.exec(s);
    if (npm) {
      if (!['ci', 'install', 'i'].includes(npm[1]) && !scripts.has(npm[1])) bad.push(`${doc}: no npm script ${npm[1]}`);
      continue;
    }
    const symbol = SYMBOL.exec(s);
    if (symbol && !codeText.includes(symbol[1])) bad.push(`${doc}: no code name ${symbol[1]}`);
  }
  return bad;
}

const existsInRepo = (candidate: string) => existsSync(join(root, candidate));

describe('the documents name only what exists', () => {
  it('every file, npm script and code name a document names in backticks is in the repository', () => {
    const bad = docs.flatMap((d) => falseClaims(d, readFileSync(join(root, d), 'utf8'), existsInRepo));
    expect(bad).toEqual([]);
  });

  it('the check finds a missing file, script and code name (so the test above can fail)', () => {
    // The missing name is built from parts, so that it occurs nowhere in the code, this file included.
    const ghost = ['noSuch', 'Function', 'Anywhere'].join('');
    const text = `See \`src/core/noSuchModule.ts\`, run \`npm run no-such-script\` and call \`${ghost}()\`; \`analyseSection\` and \`npm test\` exist.`;
    expect(falseClaims('README.md', text, existsInRepo)).toEqual([
      'README.md: no file or folder src/core/noSuchModule.ts',
      'README.md: no npm script no-such-script',
      `README.md: no code name ${ghost}`,
    ]);
  });

  it('looks at every folder README and the method document', () => {
    expect(docs).toContain('docs/method.md');
    expect(docs.filter((d) => d.startsWith('src/')).length).toBeGreaterThanOrEqual(8);
  });
});
