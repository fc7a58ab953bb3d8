// One way for scripts and tests to serve a built copy of the app: `vite preview` with this project's config (so
// the security headers of `npm start` are sent), on a port free now, answered before it is handed back.
import { spawn, type ChildProcess } from 'node:child_process';
import { createServer } from 'node:net';
import { join } from 'node:path';

/** The repository's root, from this file's place in scripts/. */
const ROOT = join(import.meta.dirname, '..');

/** Returns a port free on this machine now (others may be serving their own builds). */
export function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const probe = createServer();
    probe.once('error', reject);
    probe.listen(0, '127.0.0.1', () => {
      const { port } = probe.address() as { port: number };
      probe.close(() => resolve(port));
    });
  });
}

export interface PreviewServer {
  server: ChildProcess;
  port: number;
  /** http://127.0.0.1:<port> */
  url: string;
  stop(): void;
}

/**
 * Serves the built app in `dist` and resolves once it answers; `port` defaults to a free one. Fails with the port
 * named when the server has not answered within `waitMs` (the server is stopped then).
 */
export async function startPreview(dist: string, options: { port?: number; waitMs?: number } = {}): Promise<PreviewServer> {
  const port = options.port ?? (await freePort());
  const url = `http://127.0.0.1:${port}`;
  const server = spawn(process.execPath, [join(ROOT, 'node_modules/vite/bin/vite.js'), 'preview', '--host', '127.0.0.1', '--port', String(port), '--strictPort', '--outDir', dist], { cwd: ROOT, stdio: 'ignore' });
  const until = Date.now() + (options.waitMs ?? 30_000);
  while (Date.now() < until) {
    try {
      if ((await fetch(url)).ok) return { server, port, url, stop: () => server.kill() };
    } catch {
      // not up yet
    }
    await new Promise((r) => setTimeout(r, 200));
  }
  server.kill();
  throw new Error(`The preview server did not start on port ${port}`);
}
