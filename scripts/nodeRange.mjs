// The Node versions the project supports are declared once, in package.json "engines.node", as
// comparators npm's semver understands: "^a.b.c" (at least a.b.c, below (a+1).0.0) and ">=a.b.c",
// joined by "||". `npm test` and .ci/run check the running Node against it before anything else.
import { readFileSync } from 'node:fs';

function parse(v) {
  const m = /^v?(\d+)(?:\.(\d+))?(?:\.(\d+))?$/.exec(v.trim());
  if (!m) throw new Error(`not a version: ${v}`);
  return [Number(m[1]), Number(m[2] ?? 0), Number(m[3] ?? 0)];
}

function compare(a, b) {
  for (let i = 0; i < 3; i++) if (a[i] !== b[i]) return a[i] < b[i] ? -1 : 1;
  return 0;
}

/** True when the version (e.g. "v20.20.2") satisfies one of the range's "||" alternatives of "^x.y.z" / ">=x.y.z" comparators. */
export function satisfiesNodeRange(version, range) {
  const v = parse(version);
  return range.split('||').some((alternative) => {
    const parts = alternative.trim().split(/\s+/).filter(Boolean);
    if (parts.length === 0) return false;
    return parts.every((c) => {
      if (c.startsWith('^')) {
        const low = parse(c.slice(1));
        return compare(v, low) >= 0 && v[0] === low[0];
      }
      if (c.startsWith('>=')) return compare(v, parse(c.slice(2))) >= 0;
      if (c.startsWith('<')) return compare(v, parse(c.slice(1))) < 0;
      throw new Error(`unsupported comparator "${c}" in "${range}"`);
    });
  });
}

/** The project's declared Node range (package.json engines.node). */
export function declaredNodeRange(packageJsonPath = new URL('../package.json', import.meta.url)) {
  return JSON.parse(readFileSync(packageJsonPath, 'utf8')).engines.node;
}

/** Prints which Node runs; exits with a clear message when it is outside the declared range. */
export function checkNode() {
  const range = declaredNodeRange();
  console.log(`Node ${process.version} (this project supports ${range})`);
  if (!satisfiesNodeRange(process.version, range)) {
    console.error(`Node ${process.version} is outside the range this project supports (${range}, package.json "engines"). Install a supported Node and run again.`);
    process.exit(1);
  }
}

if (import.meta.url === `file://${process.argv[1]}`) checkNode();
