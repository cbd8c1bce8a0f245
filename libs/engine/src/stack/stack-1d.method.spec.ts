import type { EvaluationResult } from '@limitbook/contracts';
import { describe, expect, it } from 'vitest';
import { EngineError } from '../core/engine-error.js';
import { evaluateMethod } from '../registry.js';
import { analyseStack, type Stack1dOutputs } from './analyse-stack.js';
import { runMonteCarlo } from './run-monte-carlo.js';
import { stack1dMethod } from './stack-1d.method.js';
import { planStack } from './stack-plan.js';
import { gapStack } from './stack-test-data.js';

const gapInputs = {
  contributors: gapStack.contributors.map(({ distribution: _distribution, ...rest }) => rest),
  trials: 20_000,
};

const outputsOf = (result: EvaluationResult) => result.outputs as Stack1dOutputs;

function fieldsOf(run: () => unknown): Record<string, string> {
  try {
    run();
  } catch (error) {
    if (error instanceof EngineError) return error.fields;
    throw error;
  }
  throw new Error('expected an EngineError');
}

describe('stack-1d method', () => {
  it('reports the reference gap in mm without float noise (reference §7 example)', () => {
    const result = evaluateMethod(stack1dMethod, gapInputs, 'mm');
    const outputs = outputsOf(result);
    expect(outputs.nominal).toBe(3);
    expect(outputs.meanShift).toBe(0);
    expect(outputs.worstCase).toEqual({ min: 2.77, max: 3.23, tolerance: 0.23 });
    expect(outputs.rss).toEqual({ min: 2.8739, max: 3.1261, tolerance: 0.1261 });
    expect(outputs.inflatedRss).toEqual({ min: 2.8109, max: 3.1891, tolerance: 0.1891 });
    expect(outputs.monteCarlo.predictedStdDev).toBe(0.04203);
    expect(outputs.monteCarlo.trials).toBe(20_000);
    expect(outputs.monteCarlo.seed).toBe(1);
    expect(outputs.monteCarlo.ppmBelow).toBeNull();
    expect(outputs.monteCarlo.histogram).toHaveLength(50);
    expect(outputs.contributions.map((item) => item.percent)).toEqual([62.89, 15.72, 5.66, 15.72]);
    expect(result.verdict).toBeUndefined();
    expect(result.steps.map((step) => step.label)).toContain('Root sum of squares');
    expect(result.steps[0]!.latex).toBe('Y_0 = \\sum s_i n_i = 40 - 25 - 2 - 10 = 3\\,\\text{mm}');
  });

  it('judges spec limits on the chosen criterion and lists every criterion as a check', () => {
    // 2.85 … 3.15: worst case 2.77 … 3.23 and 1.5·RSS 2.8109 … 3.1891 fall outside, RSS 2.8739 … 3.1261 inside.
    const worstCase = evaluateMethod(stack1dMethod, { ...gapInputs, lowerSpec: 2.85, upperSpec: 3.15 }, 'mm');
    expect(worstCase.verdict?.pass).toBe(false);
    expect(worstCase.verdict?.checks.map((check) => [check.label, check.pass])).toEqual([
      ['Worst case within the spec limits', false],
      ['RSS within the spec limits', true],
      ['1.5·RSS within the spec limits', false],
      ['Monte Carlo: no trial outside the spec limits', expect.any(Boolean)],
    ]);
    const rss = evaluateMethod(stack1dMethod, { ...gapInputs, lowerSpec: 2.85, upperSpec: 3.15, acceptance: 'rss' }, 'mm');
    expect(rss.verdict?.pass).toBe(true);
    expect(rss.verdict?.summary).toMatch(/^Pass on the RSS criterion/);
  });

  it('gives Cp, Cpk and normal-model ppm against the limits (reference §7 definitions)', () => {
    // σ = 0.042032 (RSS/3); limits at ±RSS are ±3σ: Cp = Cpk = 1, 1350 ppm a side.
    const result = evaluateMethod(stack1dMethod, { ...gapInputs, lowerSpec: 3 - 0.126095, upperSpec: 3 + 0.126095 }, 'mm');
    const capability = outputsOf(result).capability!;
    expect(capability.cp).toBe(1);
    expect(capability.cpk).toBe(1);
    expect(capability.ppmBelow).toBe(1350);
    expect(capability.ppmTotal).toBe(2700);
    const upperOnly = evaluateMethod(stack1dMethod, { ...gapInputs, upperSpec: 3.2 }, 'mm');
    const upperCapability = outputsOf(upperOnly).capability!;
    expect(upperCapability.cp).toBeUndefined();
    // Cpk = 0.2/(3 × 0.0420317) = 1.586.
    expect(upperCapability.cpk).toBe(1.586);
  });

  it('works in inches with the same arithmetic (ISO 31-1 inch = 25.4 mm)', () => {
    const inches = {
      contributors: [
        { name: 'bore depth', sense: 1, nominal: 1.575, plusTol: 0.004, minusTol: 0.004 },
        { name: 'spacer', sense: -1, nominal: 0.984, plusTol: 0.002, minusTol: 0.002 },
      ],
      trials: 5_000,
    };
    const outputs = outputsOf(evaluateMethod(stack1dMethod, inches, 'in'));
    expect(outputs.nominal).toBe(0.591);
    expect(outputs.worstCase).toEqual({ min: 0.585, max: 0.597, tolerance: 0.006 });
    // √(0.004² + 0.002²) = 0.0044721.
    expect(outputs.rss.tolerance).toBe(0.00447);
  });

  it('centres unequal tolerances and reports the mean shift (common practice)', () => {
    const outputs = outputsOf(evaluateMethod(
      stack1dMethod,
      {
        contributors: [
          { name: 'housing', sense: 1, nominal: 50, plusTol: 0.2, minusTol: 0 },
          { name: 'pin', sense: -1, nominal: 20, plusTol: 0, minusTol: 0.1, distribution: 'uniform' },
        ],
        trials: 5_000,
      },
      'mm',
    ));
    expect(outputs.mean).toBe(30.15);
    expect(outputs.meanShift).toBe(0.15);
    expect(outputs.worstCase).toEqual({ min: 30, max: 30.3, tolerance: 0.15 });
  });

  it('rejects a signed minus tolerance, cpk on a uniform contributor and absurd trial counts, per field', () => {
    const contributors = gapInputs.contributors.map((contributor) => ({ ...contributor }));
    contributors[2] = { ...contributors[2]!, minusTol: -0.03 };
    contributors[3] = { ...contributors[3]!, distribution: 'uniform', cpk: 1.33 } as never;
    const fields = fieldsOf(() => evaluateMethod(stack1dMethod, { contributors, trials: 5_000_000, lowerSpec: 4, upperSpec: 3 }, 'mm'));
    expect(fields['inputs.contributors.2.minusTol']).toMatch(/magnitude.*without a sign/);
    expect(fields['inputs.contributors.3.cpk']).toMatch(/normal contributors only/);
    expect(fields['inputs.trials']).toMatch(/At most 2,000,000/);
    expect(fieldsOf(() => evaluateMethod(stack1dMethod, { ...gapInputs, lowerSpec: 4, upperSpec: 3 }, 'mm'))['inputs.lowerSpec']).toMatch(/below the upper/);
    const many = { contributors: Array.from({ length: 40 }, () => gapInputs.contributors[0]), trials: 2_000_000 };
    expect(fieldsOf(() => evaluateMethod(stack1dMethod, many, 'mm'))['inputs.trials']).toMatch(/at most 1,000,000 trials/);
  });

  it('gives the same result whether the Monte Carlo runs inside evaluate or is supplied from elsewhere', () => {
    const parsed = stack1dMethod.inputSchema.parse({ ...gapInputs, lowerSpec: 2.9, seed: 77 });
    const summary = runMonteCarlo(planStack(parsed), parsed.trials, parsed.seed);
    expect(analyseStack(parsed, 'mm', summary)).toEqual(stack1dMethod.evaluate(parsed, { unit: 'mm' }));
  });

  it('warns when 1.5·RSS exceeds the worst case (two equal contributors: 1.5·√2·t > 2t)', () => {
    const result = evaluateMethod(
      stack1dMethod,
      { contributors: [gapInputs.contributors[0], { ...gapInputs.contributors[0], sense: -1 }], trials: 2_000 },
      'mm',
    );
    expect(result.warnings.join(' ')).toMatch(/exceeds the worst case/);
  });
});
