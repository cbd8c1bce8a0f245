/**
 * One-dimensional tolerance stack-up: worst case, RSS, Bender's inflated RSS and a seeded Monte
 * Carlo, with capability against the spec limits of the resulting dimension.
 *
 * Conventions: plusTol and minusTol are non-negative magnitudes (limits nominal + plusTol and
 * nominal − minusTol); every contributor is centred in its limits before RSS and Monte Carlo;
 * a normal contributor's band is ±3σ (Cpk 1) unless a Cpk or σ is stated. The verdict uses the
 * worst case unless `acceptance` says otherwise; the other criteria are listed as checks.
 *
 * Running it off the event loop: `evaluate` is synchronous and pure (plain data in and out), so a
 * server can run the whole evaluation in a worker thread. For finer control the pieces are
 * exported: `planStack(inputs)` gives plain data to post to a worker, `runMonteCarlo(plan, trials,
 * seed)` samples there, and `analyseStack(inputs, unit, summary)` finishes with the same result.
 * `context.random` is not used: the seed is an input, so a saved record reproduces its result.
 */
import { stack1dInputSchema } from '@limitbook/contracts';
import { defineMethod } from '../core/method.js';
import { analyseStack } from './analyse-stack.js';
import { runMonteCarlo } from './run-monte-carlo.js';
import { planStack } from './stack-plan.js';

export const stack1dMethod = defineMethod({
  id: 'stack-1d',
  version: 1,
  title: 'One-dimensional stack-up',
  description:
    'Worst case, root sum of squares, 1.5·RSS and a seeded Monte Carlo of a chain of dimensions, with percent contribution, Cp/Cpk and predicted out-of-spec ppm against the limits of the result.',
  references: [
    'K. W. Chase, A. R. Parkinson, "A survey of research in the application of tolerance analysis to the design of mechanical assemblies", Research in Engineering Design 3 (1991)',
    'F. Scholz, "Tolerance Stack Analysis Methods", Boeing Information & Support Services, 1995',
    'A. Bender, "Statistical Tolerancing as it Relates to Quality Control and the Designer", SAE Technical Paper 680490, 1968',
    'D. C. Montgomery, Introduction to Statistical Quality Control (Cp, Cpk and the normal model of fraction nonconforming)',
  ],
  cautions: [
    'RSS and the Monte Carlo assume independent contributors whose sizes follow the stated distributions; shifted or drifting processes widen the real spread, which is why 1.5·RSS exists.',
    'Predicted ppm is a normal model of the stack; it is only as good as the contributors\u2019 stated distributions and says nothing about tails the data never showed.',
    'A stack-up is a geometric check, not a strength, pressure or safety calculation.',
  ],
  inputSchema: stack1dInputSchema,
  outputs: [
    { name: 'nominal', label: 'Nominal', kind: 'length', description: 'Σ sense·nominal.' },
    { name: 'mean', label: 'Mean (centred)', kind: 'length', description: 'Σ sense·(middle of limits): the mean once unequal tolerances are centred.' },
    { name: 'meanShift', label: 'Mean shift', kind: 'length', description: 'Mean minus nominal, from unequal tolerances.' },
    { name: 'worstCase', label: 'Worst case', kind: 'object', description: '{ min, max, tolerance }: mean ± Σ tᵢ.' },
    { name: 'rss', label: 'RSS', kind: 'object', description: '{ min, max, tolerance }: mean ± √Σ tᵢ².' },
    { name: 'inflatedRss', label: '1.5·RSS', kind: 'object', description: '{ min, max, tolerance }: mean ± 1.5·√Σ tᵢ² (Bender).' },
    {
      name: 'monteCarlo',
      label: 'Monte Carlo',
      kind: 'object',
      description: '{ trials, seed, mean, stdDev, predictedStdDev, min, max, ppmBelow, ppmAbove, histogram: [{ from, to, count }] }; ppm null where that limit is not given.',
    },
    { name: 'contributions', label: 'Contribution', kind: 'table', description: '[{ name, percent }]: each contributor\u2019s share of Σ tᵢ², the RSS variance.' },
    {
      name: 'capability',
      label: 'Capability',
      kind: 'object',
      description: '{ sigma, cp, cpk, ppmBelow, ppmAbove, ppmTotal } of a normal stack with σ = √Σσᵢ², when spec limits are given.',
    },
  ],
  evaluate(inputs, { unit }) {
    const plan = planStack(inputs);
    return analyseStack(inputs, unit, runMonteCarlo(plan, inputs.trials, inputs.seed), plan);
  },
});
