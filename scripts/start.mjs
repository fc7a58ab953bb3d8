// `npm start`: builds the app when the build is missing or older than the sources, then serves it
// on localhost with `vite preview` (which prints the URL). The demo section opens at start.
import { spawnSync, spawn } from 'node:child_process';
import { existsSync, readdirSync, statSync } from 'node:fs';
import { join } from 'node:path';

function newest(path) {
  if (!existsSync(path)) return 0;
  const st = statSync(path);
  if (!st.isDirectory()) return st.mtimeMs;
  let t = st.mtimeMs;
  for (const name of readdirSync(path)) t = Math.max(t, newest(join(path, name)));
  return t;
}

const built = existsSync('dist/index.html') ? statSync('dist/index.html').mtimeMs : 0;
const sources = Math.max(newest('src'), newest('public'), newest('index.html'), newest('vite.config.ts'));
if (built < sources) {
  console.log('Building Foldroot ...');
  const r = spawnSync('npx', ['vite', 'build', '--logLevel', 'warn'], { stdio: 'inherit' });
  if (r.status !== 0) process.exit(r.status ?? 1);
}
const port = process.env.PORT ?? '4173';
console.log('Serving Foldroot (Ctrl+C to stop). Open the Local URL below in a browser:');
const child = spawn('npx', ['vite', 'preview', '--host', '127.0.0.1', '--port', port], { stdio: 'inherit' });
for (const sig of ['SIGINT', 'SIGTERM']) process.on(sig, () => child.kill(sig));
child.on('exit', (code) => process.exit(code ?? 0));
