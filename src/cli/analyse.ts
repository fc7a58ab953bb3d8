// `npm run --silent analyse -- FILE [--json]`: analyse a section file (or a project file that
// embeds one under "section") and print a table, or the JSON shape of issue 3. Bad input:
// exit code 2 and one line on stderr. A thin shell over src/core.
import { readFileSync } from 'node:fs';
import { analyseSection } from '../core/analysis/analyseSection';
import { validateSection } from '../core/model/validateSection';
import { formatTable } from './formatTable';
import { toJsonReport } from './toJsonReport';

function fail(message: string): never {
  process.stderr.write(`analyse: ${message.replace(/\s+/g, ' ')}\n`);
  process.exit(2);
}

function sectionOf(doc: unknown): unknown {
  // The app's project file embeds the section under "section".
  if (typeof doc === 'object' && doc !== null && !Array.isArray(doc) && !('horizons' in doc) && 'section' in doc) {
    return (doc as { section: unknown }).section;
  }
  return doc;
}

function main(argv: string[]): void {
  const json = argv.includes('--json');
  const files = argv.filter((a) => a !== '--json' && a !== '--');
  const unknownFlag = files.find((a) => a.startsWith('--'));
  if (unknownFlag) fail(`unknown option ${unknownFlag}; usage: analyse FILE [--json]`);
  if (files.length !== 1) fail('give exactly one section file; usage: analyse FILE [--json]');
  const file = files[0];
  let text: string;
  try {
    text = readFileSync(file, 'utf8');
  } catch (e) {
    fail(`cannot read ${file}: ${(e as NodeJS.ErrnoException).code ?? 'read error'}; check the path.`);
  }
  let doc: unknown;
  try {
    doc = JSON.parse(text);
  } catch (e) {
    fail(`${file} is not valid JSON (${(e as Error).message}); fix the file.`);
  }
  const v = validateSection(sectionOf(doc));
  const outcome = v.ok ? analyseSection(v.section) : v;
  if (!outcome.ok) {
    const [first, ...rest] = outcome.problems;
    fail(`${file}: ${first.message}${rest.length > 0 ? ` (and ${rest.length} more problem${rest.length === 1 ? '' : 's'})` : ''}`);
  }
  process.stdout.write(json ? `${JSON.stringify(toJsonReport(outcome.analysis), null, 2)}\n` : formatTable(outcome.analysis));
}

try {
  main(process.argv.slice(2));
} catch (e) {
  // Nothing above should throw; if it does, still keep to one line and exit code 2.
  fail(`internal error: ${(e as Error).message}`);
}
