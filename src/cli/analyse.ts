// `npm run --silent analyse -- FILE [--json] [--scenario NAME]`: analyse a section file, a
// section under "section", or the app's project file (its active scenario, or the one named),
// and print a table, or the JSON report of src/cli/README.md §JSON report. Bad input: exit code 2 and one line on
// stderr. A thin shell over src/core.
import { readFileSync, statSync } from 'node:fs';
import { LIMITS, fileTooLargeMessage } from '../core/model/limits';
import { jsonDepthProblem } from '../core/model/jsonDepthProblem';
import { analyseSection } from '../core/analysis/analyseSection';
import { validateSection } from '../core/model/validateSection';
import { formatTable } from './formatTable';
import { terminalText } from './terminalText';
import { sectionOfFile } from './sectionOfFile';
import { toJsonReport } from './toJsonReport';

const USAGE = 'usage: analyse FILE [--json] [--scenario NAME]';

/** What --help prints: the usage and the rules a user of the table needs (docs/method.md). */
const HELP = `${USAGE}
  FILE             a section file, a section under "section", or the app's project file
  --json           the JSON report (src/cli/README.md) instead of the table
  --scenario NAME  the scenario of a project file to analyse (default its active one)
Chamberlin depth is "not meaningful" when the bed-length shortening |L - W| is below the digitising
resolution: the file's "resolution" (the app writes the one it used: one scan pixel), else 1e-4 of the
pin width (docs/method.md, Digitising resolution).
`;

function fail(message: string): never {
  process.stderr.write(`analyse: ${terminalText(message.replace(/\s+/g, ' '))}\n`);
  process.exit(2);
}

function main(argv: string[]): void {
  const args = argv.filter((a) => a !== '--');
  if (args.includes('--help') || args.includes('-h')) {
    process.stdout.write(HELP);
    return;
  }
  const json = args.includes('--json');
  let scenario: string | undefined;
  const files: string[] = [];
  for (let i = 0; i < args.length; i++) {
    const a = args[i];
    if (a === '--json') continue;
    if (a === '--scenario' || a.startsWith('--scenario=')) {
      if (scenario !== undefined) fail(`give --scenario once; ${USAGE}`);
      scenario = a === '--scenario' ? args[++i] : a.slice('--scenario='.length);
      if (scenario === undefined || scenario === '') fail(`--scenario needs a scenario name; ${USAGE}`);
      continue;
    }
    if (a.startsWith('--')) fail(`unknown option ${a}; ${USAGE}`);
    files.push(a);
  }
  if (files.length !== 1) fail(`give exactly one section or project file; ${USAGE}`);
  const file = files[0];
  // Size first, so that a huge file or a device such as /dev/zero is refused before anything is read.
  let size: number;
  try {
    const st = statSync(file);
    if (!st.isFile()) fail(`${file} is not a regular file; give a section or project file.`);
    size = st.size;
  } catch (e) {
    fail(`cannot read ${file}: ${(e as NodeJS.ErrnoException).code ?? 'read error'}; check the path.`);
  }
  if (size > LIMITS.fileBytes) fail(`${file}: ${fileTooLargeMessage(size, LIMITS.fileBytes)}`);
  let text: string;
  try {
    text = readFileSync(file, 'utf8');
  } catch (e) {
    fail(`cannot read ${file}: ${(e as NodeJS.ErrnoException).code ?? 'read error'}; check the path.`);
  }
  const deep = jsonDepthProblem(text);
  if (deep) fail(`${file}: ${deep}; this is not a section or project file.`);
  let doc: unknown;
  try {
    // A byte-order mark is not JSON but some editors write one; the app's reader skips it too.
    doc = JSON.parse(text.charCodeAt(0) === 0xfeff ? text.slice(1) : text);
  } catch (e) {
    fail(`${file} is not valid JSON (${(e as Error).message}); fix the file.`);
  }
  const found = sectionOfFile(doc, scenario);
  if (!found.ok) fail(`${file}: ${found.message}`);
  const v = validateSection(found.section);
  const outcome = v.ok ? analyseSection(v.section) : v;
  if (!outcome.ok) {
    const [first, ...rest] = outcome.problems;
    fail(`${file}: ${first.message}${rest.length > 0 ? ` (and ${rest.length} more problem${rest.length === 1 ? '' : 's'})` : ''}`);
  }
  // Horizons a project leaves out (not ready) lead the notes, as in the app.
  const analysis = { ...outcome.analysis, notes: [...found.notes, ...outcome.analysis.notes] };
  process.stdout.write(json ? `${JSON.stringify(toJsonReport(analysis), null, 2)}\n` : formatTable(analysis, found.source));
}

// Output piped into a reader that stops early (`| head`): end quietly, as command-line tools do.
process.stdout.on('error', (e: NodeJS.ErrnoException) => {
  if (e.code === 'EPIPE') process.exit(0);
  throw e;
});

try {
  main(process.argv.slice(2));
} catch (e) {
  // Nothing above should throw; if it does, still keep to one line and exit code 2.
  fail(`internal error: ${(e as Error).message}`);
}
