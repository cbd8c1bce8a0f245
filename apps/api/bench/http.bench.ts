// Throughput and latency of the evaluation routes at 50 concurrent connections on loopback,
// next to a bare node:http server answering the same JSON in the same run: the ratio is the figure.
// Server CPU time per request (Linux /proc) is printed too: on a shared, busy machine requests/s
// swing with the load, while CPU per request stays close to the work the server really does.
// Needs the built server (npm run bench builds it first). Run: npx tsx apps/api/bench/http.bench.ts
import { execFileSync, spawn, type ChildProcess } from 'node:child_process';
import { existsSync, mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import { dirname, join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import autocannon from 'autocannon';

const here = dirname(fileURLToPath(import.meta.url));
const repoRoot = resolve(here, '../../..');
const connections = 50;
const durationSeconds = Number(process.env.BENCH_SECONDS ?? 10);

const wallInputs = {
  arrangement: 'coaxial',
  feature: { featureType: 'internal', lowerLimit: 19.9, upperLimit: 20.1 },
  datum: { featureType: 'external', lowerLimit: 29.9, upperLimit: 30.1 },
  positionTolerance: 0.2,
  toleranceModifier: 'LMC',
  datumModifier: 'LMB',
};
const batch = {
  items: [
    { method: 'wall-thickness', inputs: wallInputs },
    { method: 'iso286-fit', inputs: { nominalSize: 50, hole: 'H7', shaft: 'g6' } },
    { method: 'iso286-fit', inputs: { nominalSize: 10, hole: 'H7', shaft: 'p6' } },
    { method: 'feature-boundary', inputs: { featureType: 'internal', lowerLimit: 10, upperLimit: 10.2, tolerance: 0.1, modifier: 'MMC' } },
    { method: 'fastener-floating', inputs: { holeSize: 10.5, fastenerSize: 10 } },
    { method: 'iso2768', inputs: { nominalSize: 75, class: 'm' } },
  ],
};

function freePort(): Promise<number> {
  return new Promise((done, fail) => {
    const server = createServer();
    server.once('error', fail);
    server.listen(0, '127.0.0.1', () => {
      const address = server.address();
      server.close(() => done(typeof address === 'object' && address ? address.port : 0));
    });
  });
}

async function waitForHealth(base: string, child: ChildProcess): Promise<void> {
  const deadline = Date.now() + 120_000;
  while (Date.now() < deadline) {
    if (child.exitCode !== null) throw new Error(`Server exited with code ${child.exitCode}`);
    try {
      const response = await fetch(`${base}/api/health`);
      if (response.ok) return;
    } catch {
      // not listening yet
    }
    await new Promise((wait) => setTimeout(wait, 250));
  }
  throw new Error('Server did not become healthy within 120 s');
}

function startProcess(args: string[], env: Record<string, string>): ChildProcess {
  const child = spawn(process.execPath, args, { cwd: repoRoot, env: { ...process.env, ...env }, stdio: ['ignore', 'ignore', 'inherit'] });
  return child;
}

interface Measured {
  target: string;
  'requests/s': number;
  'p50 ms': number;
  'p99 ms': number;
  errors: number;
  'server CPU ms/request': number | string;
}

const clockTicksPerSecond = (() => {
  try {
    return Number(execFileSync('getconf', ['CLK_TCK'], { encoding: 'utf8' }).trim()) || 100;
  } catch {
    return 100;
  }
})();

/** User + system CPU time of a process and all its threads so far, in ms; null where /proc is not there. */
function cpuMs(pid: number | undefined): number | null {
  const file = `/proc/${pid}/stat`;
  if (pid === undefined || !existsSync(file)) return null;
  // Fields after the command name, which is in parentheses and may hold spaces.
  const fields = readFileSync(file, 'utf8').split(') ')[1]!.split(' ');
  return ((Number(fields[11]) + Number(fields[12])) * 1000) / clockTicksPerSecond;
}

async function measure(target: string, url: string, body: unknown, headers: Record<string, string>, serverPid: number | undefined): Promise<Measured> {
  const cpuBefore = cpuMs(serverPid);
  const result = await autocannon({
    url,
    method: 'POST',
    connections,
    duration: durationSeconds,
    headers: { 'content-type': 'application/json', ...headers },
    body: JSON.stringify(body),
  });
  const cpuAfter = cpuMs(serverPid);
  return {
    target,
    'requests/s': Math.round(result.requests.average),
    'p50 ms': result.latency.p50,
    'p99 ms': result.latency.p99,
    errors: result.errors + result.non2xx,
    'server CPU ms/request': cpuBefore === null || cpuAfter === null || result.requests.total === 0 ? '-' : Number(((cpuAfter - cpuBefore) / result.requests.total).toFixed(3)),
  };
}

async function main(): Promise<void> {
  const serverEntry = join(repoRoot, 'apps/api/dist/main.js');
  readFileSync(serverEntry); // fail early with ENOENT when the server is not built
  const dataDir = mkdtempSync(join(tmpdir(), 'limitbook-bench-'));
  const port = await freePort();
  const base = `http://127.0.0.1:${port}`;
  const server = startProcess([serverEntry], { PORT: String(port), LIMITBOOK_DATA_DIR: dataDir, LIMITBOOK_AUTH_RATE_LIMIT: '100000' });
  const processes: ChildProcess[] = [server];
  try {
    await waitForHealth(base, server);
    const people = JSON.parse(readFileSync(join(repoRoot, 'content/demo/people.json'), 'utf8')) as { people: { role: string; email: string; password: string }[] };
    const reader = people.people.find((person) => person.role === 'reader')!;
    const signIn = await fetch(`${base}/api/auth/sign-in`, {
      method: 'POST',
      headers: { 'content-type': 'application/json' },
      body: JSON.stringify({ email: reader.email, password: reader.password }),
    });
    const { accessToken } = (await signIn.json()) as { accessToken: string };
    const auth = { authorization: `Bearer ${accessToken}` };

    const singleUrl = `${base}/api/methods/wall-thickness/evaluate`;
    const batchUrl = `${base}/api/evaluate`;
    const singleJson = await (await fetch(singleUrl, { method: 'POST', headers: { 'content-type': 'application/json', ...auth }, body: JSON.stringify({ inputs: wallInputs }) })).text();
    const batchJson = await (await fetch(batchUrl, { method: 'POST', headers: { 'content-type': 'application/json', ...auth }, body: JSON.stringify(batch) })).text();

    // The bare server runs in its own process, like the real one, and returns the captured responses.
    const barePort = await freePort();
    const bareSource = `
      const http = require('node:http');
      const single = ${JSON.stringify(singleJson)};
      const batch = ${JSON.stringify(batchJson)};
      http.createServer((req, res) => {
        let body = '';
        req.on('data', (chunk) => { body += chunk; });
        req.on('end', () => {
          JSON.parse(body);
          res.writeHead(200, { 'content-type': 'application/json' });
          res.end(req.url === '/batch' ? batch : single);
        });
      }).listen(${barePort}, '127.0.0.1');`;
    const bare = spawn(process.execPath, ['-e', bareSource], { stdio: ['ignore', 'ignore', 'inherit'] });
    processes.push(bare);
    await new Promise((wait) => setTimeout(wait, 500));

    const rows: Measured[] = [];
    rows.push(await measure('POST /api/methods/wall-thickness/evaluate', singleUrl, { inputs: wallInputs }, auth, server.pid));
    rows.push(await measure('bare node:http, same JSON', `http://127.0.0.1:${barePort}/single`, { inputs: wallInputs }, {}, bare.pid));
    rows.push(await measure(`POST /api/evaluate (${batch.items.length} items)`, batchUrl, batch, auth, server.pid));
    rows.push(await measure('bare node:http, same JSON', `http://127.0.0.1:${barePort}/batch`, batch, {}, bare.pid));
    console.log(`\nHTTP evaluation, ${connections} connections, ${durationSeconds} s each, loopback`);
    console.table(rows);
    console.log(`Limitbook / bare ratio: single ${(rows[0]!['requests/s'] / rows[1]!['requests/s']).toFixed(3)}, batch ${(rows[2]!['requests/s'] / rows[3]!['requests/s']).toFixed(3)}`);
  } finally {
    for (const child of processes) child.kill('SIGTERM');
    rmSync(dataDir, { recursive: true, force: true });
  }
}

await main();
