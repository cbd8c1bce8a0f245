import { spawn, type ChildProcess } from 'node:child_process';
import { existsSync, mkdtempSync, rmSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';

export const repoRoot = resolve(import.meta.dirname, '../../../..');
// Overridable so a server built elsewhere (e.g. into a scratch folder) can be tried.
const serverEntry = process.env.LIMITBOOK_E2E_SERVER ?? join(repoRoot, 'apps/api/dist/main.js');
const webIndex = join(repoRoot, 'apps/web/dist/index.html');

export type RunningServer = {
  baseUrl: string;
  dataDir: string;
  /** Everything the server printed so far, for failure messages. */
  output: () => string;
  stop: () => Promise<void>;
};

export async function freePort(): Promise<number> {
  return new Promise((resolvePort, reject) => {
    const probe = createServer();
    probe.unref();
    probe.on('error', reject);
    probe.listen(0, '127.0.0.1', () => {
      const address = probe.address();
      probe.close(() => (typeof address === 'object' && address ? resolvePort(address.port) : reject(new Error('No port'))));
    });
  });
}

async function waitForHealth(baseUrl: string, child: ChildProcess, output: () => string, timeoutMs: number) {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    if (child.exitCode !== null) throw new Error(`The server exited with code ${child.exitCode} before it was healthy:\n${output()}`);
    try {
      const response = await fetch(`${baseUrl}/api/health`);
      if (response.ok) return;
    } catch {
      // Not listening yet.
    }
    await new Promise((done) => setTimeout(done, 250));
  }
  throw new Error(`The server did not report healthy within ${timeoutMs / 1000} s:\n${output()}`);
}

/**
 * Starts the real, built server (`apps/api/dist/main.js`) on a free port with a fresh data
 * folder, so every test file gets the demo organisation on an empty database.
 */
export async function startServer({ env = {}, timeoutMs = 90_000 }: { env?: Record<string, string>; timeoutMs?: number } = {}): Promise<RunningServer> {
  for (const [file, hint] of [
    [serverEntry, 'build the api first: npx nx run @limitbook/api:build'],
    [webIndex, 'build the web app first: npx nx run @limitbook/web:build'],
  ] as const) {
    if (!existsSync(file)) throw new Error(`${file} is missing; ${hint}`);
  }

  const port = await freePort();
  const dataDir = mkdtempSync(join(tmpdir(), 'limitbook-e2e-'));
  const baseUrl = `http://localhost:${port}`;
  const chunks: string[] = [];
  const output = () => chunks.join('').slice(-8000);

  const child = spawn(process.execPath, [serverEntry], {
    cwd: repoRoot,
    env: {
      ...process.env,
      NODE_ENV: 'production',
      PORT: String(port),
      LIMITBOOK_DATA_DIR: dataDir,
      PUBLIC_URL: baseUrl,
      SMTP_URL: '',
      DATABASE_URL: '',
      ...env,
    },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  child.stdout?.on('data', (chunk: Buffer) => chunks.push(chunk.toString()));
  child.stderr?.on('data', (chunk: Buffer) => chunks.push(chunk.toString()));

  const stop = async () => {
    if (child.exitCode === null && child.signalCode === null) {
      const exited = new Promise<void>((done) => child.once('exit', () => done()));
      child.kill('SIGTERM');
      const timer = setTimeout(() => child.kill('SIGKILL'), 10_000);
      await exited;
      clearTimeout(timer);
    }
    rmSync(dataDir, { recursive: true, force: true });
  };

  try {
    await waitForHealth(baseUrl, child, output, timeoutMs);
  } catch (error) {
    await stop();
    throw error;
  }
  return { baseUrl, dataDir, output, stop };
}
