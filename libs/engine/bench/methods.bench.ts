// In-process evaluations per second of every built-in method, and the Monte Carlo core
// against a hand-written Float64Array loop doing the same arithmetic.
// Run: npm run bench (or `npx tsx libs/engine/bench/methods.bench.ts`).
import { readFileSync } from 'node:fs';
import { designDefinitionSchema } from '@limitbook/contracts';
import { builtInMethods, checkMethodDesign, evaluateMethod, evaluateMethodDesign, findMethod, runDesignTests } from '../src/index.js';
import { createRandomStream } from '../src/stack/index.js';
import { methodSamples } from './method-samples.js';

function evaluationsPerSecond(run: () => void, seconds = 1): number {
  for (let i = 0; i < 50; i += 1) run();
  let count = 0;
  const start = performance.now();
  const deadline = start + seconds * 1000;
  while (performance.now() < deadline) {
    run();
    count += 1;
  }
  return count / ((performance.now() - start) / 1000);
}

const rows: { method: string; version: number; 'evaluations/s': string; 'µs/evaluation': string }[] = [];
for (const method of builtInMethods) {
  const sample = methodSamples[method.id];
  if (!sample) throw new Error(`No benchmark sample for method "${method.id}": add one to bench/method-samples.ts`);
  const rate = evaluationsPerSecond(() => evaluateMethod(method, sample, 'mm'));
  rows.push({ method: method.id, version: method.version, 'evaluations/s': Math.round(rate).toLocaleString('en-US'), 'µs/evaluation': (1e6 / rate).toFixed(1) });
}
console.log('\nIn-process method evaluation (one core)');
console.table(rows);

const trials = 1_000_000;
const contributorCount = 20;
const contributors = Array.from({ length: contributorCount }, (_, index) => ({
  name: `Part ${index + 1}`,
  sense: index % 3 === 0 ? -1 : 1,
  nominal: 10 + index,
  plusTol: 0.05 + index * 0.002,
  minusTol: 0.05 + index * 0.002,
}));
const stack = findMethod('stack-1d');
if (!stack) throw new Error('stack-1d is not registered');

const engineStart = performance.now();
const result = evaluateMethod(stack, { contributors, trials, seed: 11 }, 'mm');
const engineMs = performance.now() - engineStart;

// The same arithmetic by hand: a seeded stream, polar-method normals at ±t = 3σ, summed into one Float64Array.
const baselineStart = performance.now();
const next = createRandomStream(11);
const sums = new Float64Array(trials);
for (const contributor of contributors) {
  const scale = (contributor.sense * contributor.plusTol) / 3;
  for (let i = 0; i < trials; i += 2) {
    let u: number;
    let v: number;
    let s: number;
    do {
      u = 2 * next() - 1;
      v = 2 * next() - 1;
      s = u * u + v * v;
    } while (s >= 1 || s === 0);
    const factor = scale * Math.sqrt((-2 * Math.log(s)) / s);
    sums[i]! += u * factor;
    if (i + 1 < trials) sums[i + 1]! += v * factor;
  }
}
let mean = 0;
for (let i = 0; i < trials; i += 1) mean += sums[i]!;
mean /= trials;
let squares = 0;
for (let i = 0; i < trials; i += 1) squares += (sums[i]! - mean) ** 2;
const baselineStdDev = Math.sqrt(squares / (trials - 1));
const baselineMs = performance.now() - baselineStart;

const monteCarlo = result.outputs.monteCarlo as { stdDev: number };
console.log(`\nMonte Carlo, ${trials.toLocaleString('en-US')} trials × ${contributorCount} contributors`);
console.table([
  { run: 'stack-1d method (whole evaluation)', 'wall time ms': engineMs.toFixed(0), 'std dev': monteCarlo.stdDev },
  { run: 'hand-written Float64Array loop', 'wall time ms': baselineMs.toFixed(0), 'std dev': Number(baselineStdDev.toFixed(6)) },
  { run: 'ratio method / loop', 'wall time ms': (engineMs / baselineMs).toFixed(2), 'std dev': '' },
]);

// In-house methods: the demo designs as the designer's live preview and the catalog run them.
const designRows: { design: string; task: string; 'runs/s': string; 'ms/run': string }[] = [];
for (const file of ['o-ring-squeeze', 'press-fit-pressure']) {
  const { definition } = JSON.parse(readFileSync(new URL(`../../../content/demo/methods/${file}.json`, import.meta.url), 'utf8')) as { definition: unknown };
  const design = designDefinitionSchema.parse(definition);
  for (const [task, run] of [
    ['evaluate (defaults)', () => evaluateMethodDesign(design, {})],
    ['check (save/preview)', () => checkMethodDesign(design)],
    [`test table (${design.tests.length} rows)`, () => runDesignTests(design)],
  ] as const) {
    const rate = evaluationsPerSecond(run, 0.5);
    designRows.push({ design: file, task, 'runs/s': Math.round(rate).toLocaleString('en-US'), 'ms/run': (1000 / rate).toFixed(2) });
  }
}
console.log('\nIn-house method designs (one core, in process; the API adds a worker hop)');
console.table(designRows);
