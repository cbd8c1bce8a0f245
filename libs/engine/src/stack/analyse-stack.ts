import type { DerivationStep, LengthUnit, Stack1dInputs, Verdict, VerdictCheck } from '@limitbook/contracts';
import type { MethodResult } from '../core/method.js';
import { formatLength, formatNumber, latexUnit, lengthDecimals, roundLength, roundTo } from '../core/units.js';
import type { MonteCarloSummary } from './run-monte-carlo.js';
import { rssInflationFactor, stackClosedForms, type StackRange } from './stack-closed-forms.js';
import { stackCapability } from './stack-capability.js';
import { planStack, type StackPlan } from './stack-plan.js';

export type Stack1dOutputs = {
  nominal: number;
  mean: number;
  meanShift: number;
  worstCase: StackRange;
  rss: StackRange;
  inflatedRss: StackRange;
  monteCarlo: {
    trials: number;
    seed: number;
    mean: number;
    stdDev: number;
    predictedStdDev: number;
    min: number;
    max: number;
    ppmBelow: number | null;
    ppmAbove: number | null;
    histogram: { from: number; to: number; count: number }[];
  };
  contributions: { name: string; percent: number }[];
  capability?: { sigma: number; cp?: number; cpk: number; ppmBelow: number; ppmAbove: number; ppmTotal: number };
};

/** Longest list of terms written out in a derivation before it is abbreviated. */
const maxTermsShown = 12;

/**
 * The stack-up result from its inputs and a Monte Carlo summary of the same plan. Split from the
 * sampling so a server may run `runMonteCarlo(planStack(inputs), trials, seed)` elsewhere and
 * finish here with the same result.
 */
export function analyseStack(inputs: Stack1dInputs, unit: LengthUnit, monteCarlo: MonteCarloSummary, plan: StackPlan = planStack(inputs)): MethodResult<Stack1dOutputs> {
  const closed = stackClosedForms(plan);
  const { lowerSpec, upperSpec } = inputs;
  const hasSpec = lowerSpec !== undefined || upperSpec !== undefined;
  const length = (value: number) => roundLength(value, unit);
  const statistic = (value: number) => roundTo(value, lengthDecimals[unit] + 1);
  const range = (value: StackRange): StackRange => ({ min: length(value.min), max: length(value.max), tolerance: length(value.tolerance) });
  const samplePpm = (count: number) => roundSignificant((1e6 * count) / monteCarlo.trials, 3);
  const capability = hasSpec && closed.sigma > 0 ? stackCapability(closed.mean, closed.sigma, lowerSpec, upperSpec) : undefined;

  const outputs: Stack1dOutputs = {
    nominal: length(closed.nominal),
    mean: length(closed.mean),
    meanShift: length(closed.meanShift),
    worstCase: range(closed.worstCase),
    rss: range(closed.rss),
    inflatedRss: range(closed.inflatedRss),
    monteCarlo: {
      trials: monteCarlo.trials,
      seed: monteCarlo.seed,
      mean: statistic(monteCarlo.mean),
      stdDev: statistic(monteCarlo.stdDev),
      predictedStdDev: statistic(closed.sigma),
      min: length(monteCarlo.min),
      max: length(monteCarlo.max),
      ppmBelow: lowerSpec === undefined ? null : samplePpm(monteCarlo.countBelow),
      ppmAbove: upperSpec === undefined ? null : samplePpm(monteCarlo.countAbove),
      histogram: monteCarlo.histogram.map((bin) => ({ from: statistic(bin.from), to: statistic(bin.to), count: bin.count })),
    },
    contributions: closed.contributions.map((item) => ({ name: item.name, percent: roundTo(item.percent, 2) })),
    ...(capability
      ? {
          capability: {
            sigma: statistic(closed.sigma),
            ...(capability.cp !== undefined ? { cp: roundTo(capability.cp, 3) } : {}),
            cpk: roundTo(capability.cpk, 3),
            ppmBelow: roundSignificant(capability.ppmBelow, 3),
            ppmAbove: roundSignificant(capability.ppmAbove, 3),
            ppmTotal: roundSignificant(capability.ppmTotal, 3),
          },
        }
      : {}),
  };

  const warnings: string[] = [];
  if (closed.inflatedRss.tolerance > closed.worstCase.tolerance) {
    warnings.push('With this few contributors 1.5·RSS exceeds the worst case; the worst case is the real bound.');
  }
  if (plan.contributors.length < 4) {
    warnings.push('RSS leans on the sum of many independent contributors being near normal; with fewer than four, prefer the worst case or the Monte Carlo.');
  }
  if (capability && capability.ppmTotal > 0 && capability.ppmTotal < 1e6 / monteCarlo.trials) {
    warnings.push(
      `The predicted ${formatPpm(roundSignificant(capability.ppmTotal, 3))} ppm is below what ${monteCarlo.trials.toLocaleString('en-US')} trials can resolve (one trial is ${formatPpm(roundSignificant(1e6 / monteCarlo.trials, 3))} ppm).`,
    );
  }

  return {
    outputs,
    ...(hasSpec ? { verdict: stackVerdict(inputs, closed, monteCarlo, unit) } : {}),
    warnings,
    steps: stackSteps(plan, closed, monteCarlo, capability, inputs, unit),
  };
}

function stackVerdict(inputs: Stack1dInputs, closed: ReturnType<typeof stackClosedForms>, monteCarlo: MonteCarloSummary, unit: LengthUnit): Verdict {
  const { lowerSpec, upperSpec } = inputs;
  const limitsText = `${lowerSpec === undefined ? '−∞' : formatLength(lowerSpec, unit)} … ${upperSpec === undefined ? '+∞' : formatLength(upperSpec, unit)} ${unit}`;
  const within = (range: StackRange) =>
    (lowerSpec === undefined || roundLength(range.min, unit) >= roundLength(lowerSpec, unit)) &&
    (upperSpec === undefined || roundLength(range.max, unit) <= roundLength(upperSpec, unit));
  const rangeCheck = (label: string, range: StackRange): VerdictCheck => ({
    label,
    pass: within(range),
    detail: `${formatLength(range.min, unit)} … ${formatLength(range.max, unit)} ${unit} against ${limitsText}`,
  });
  const checksByCriterion = {
    'worst-case': rangeCheck('Worst case within the spec limits', closed.worstCase),
    rss: rangeCheck('RSS within the spec limits', closed.rss),
    'inflated-rss': rangeCheck('1.5·RSS within the spec limits', closed.inflatedRss),
  } as const;
  const outside = monteCarlo.countBelow + monteCarlo.countAbove;
  const monteCarloCheck: VerdictCheck = {
    label: 'Monte Carlo: no trial outside the spec limits',
    pass: outside === 0,
    detail: `${outside.toLocaleString('en-US')} of ${monteCarlo.trials.toLocaleString('en-US')} trials outside (${formatPpm(roundSignificant((1e6 * outside) / monteCarlo.trials, 3))} ppm), seed ${monteCarlo.seed}`,
  };
  const decisive = checksByCriterion[inputs.acceptance];
  const criterionName = { 'worst-case': 'worst case', rss: 'RSS', 'inflated-rss': '1.5·RSS' }[inputs.acceptance];
  return {
    pass: decisive.pass,
    summary: `${decisive.pass ? 'Pass' : 'Fail'} on the ${criterionName} criterion: ${decisive.detail}. The other checks are for information.`,
    checks: [checksByCriterion['worst-case'], checksByCriterion.rss, checksByCriterion['inflated-rss'], monteCarloCheck],
  };
}

function stackSteps(
  plan: StackPlan,
  closed: ReturnType<typeof stackClosedForms>,
  monteCarlo: MonteCarloSummary,
  capability: ReturnType<typeof stackCapability> | undefined,
  inputs: Stack1dInputs,
  unit: LengthUnit,
): DerivationStep[] {
  const u = latexUnit(unit);
  const len = (value: number) => formatLength(value, unit);
  const stat = (value: number) => formatNumber(roundTo(value, lengthDecimals[unit] + 1), lengthDecimals[unit] + 1);
  const signed = (values: { sense: number; value: number }[]) =>
    abbreviate(values.map(({ sense, value }, index) => `${sense < 0 ? '- ' : index === 0 ? '' : '+ '}${len(value)}`)).join(' ');
  const plus = (terms: string[]) => abbreviate(terms).join(' + ');
  const halfBands = plan.contributors.map((contributor) => contributor.halfBand);
  const steps: DerivationStep[] = [
    {
      label: 'Nominal',
      latex: `Y_0 = \\sum s_i n_i = ${signed(plan.contributors.map((c) => ({ sense: c.sense, value: c.nominal })))} = ${len(closed.nominal)}${u}`,
      value: `${len(closed.nominal)} ${unit}`,
    },
  ];
  if (plan.contributors.some((contributor) => contributor.centre !== contributor.nominal)) {
    steps.push({
      label: 'Mean with each contributor centred in its limits',
      latex: `\\bar Y = \\sum s_i \\frac{(n_i + p_i) + (n_i - m_i)}{2} = ${signed(plan.contributors.map((c) => ({ sense: c.sense, value: c.centre })))} = ${len(closed.mean)}${u}`,
      value: `${len(closed.mean)} ${unit} (shift ${len(closed.meanShift)} ${unit})`,
    });
  }
  steps.push(
    {
      label: 'Worst case',
      latex: `T_{WC} = \\sum |s_i|\\,t_i = ${plus(halfBands.map(len))} = ${len(closed.worstCase.tolerance)}${u}`,
      value: `${len(closed.worstCase.min)} … ${len(closed.worstCase.max)} ${unit}`,
    },
    {
      label: 'Root sum of squares',
      latex: `T_{RSS} = \\sqrt{\\sum (s_i t_i)^2} = \\sqrt{${plus(halfBands.map((t) => `${len(t)}^2`))}} = ${len(closed.rss.tolerance)}${u}`,
      value: `${len(closed.rss.min)} … ${len(closed.rss.max)} ${unit}`,
    },
    {
      label: 'Inflated RSS (Bender)',
      latex: `T_{1.5RSS} = ${rssInflationFactor} \\times ${len(closed.rss.tolerance)} = ${len(closed.inflatedRss.tolerance)}${u}`,
      value: `${len(closed.inflatedRss.min)} … ${len(closed.inflatedRss.max)} ${unit}`,
    },
    {
      label: 'Predicted σ from the contributors\u2019 distributions',
      latex: `\\sigma = \\sqrt{\\sum \\sigma_i^2} = \\sqrt{${plus(plan.contributors.map((c) => `${stat(c.sigma)}^2`))}} = ${stat(closed.sigma)}${u}`,
      value: `${stat(closed.sigma)} ${unit}`,
    },
    {
      label: 'Monte Carlo',
      latex: `N = ${monteCarlo.trials},\\ \\text{seed } ${monteCarlo.seed}:\\ \\hat\\mu = ${stat(monteCarlo.mean)}${u},\\ \\hat\\sigma = ${stat(monteCarlo.stdDev)}${u}`,
      value: `${len(monteCarlo.min)} … ${len(monteCarlo.max)} ${unit}`,
    },
  );
  if (capability) {
    const { lowerSpec, upperSpec } = inputs;
    const mean = len(closed.mean);
    const sigma = stat(closed.sigma);
    if (capability.cp !== undefined && lowerSpec !== undefined && upperSpec !== undefined) {
      steps.push({
        label: 'Cp',
        latex: `C_p = \\frac{USL - LSL}{6\\sigma} = \\frac{${len(upperSpec)} - ${len(lowerSpec)}}{6 \\times ${sigma}} = ${formatNumber(capability.cp, 3)}`,
        value: formatNumber(capability.cp, 3),
      });
    }
    const sides = [
      ...(upperSpec !== undefined ? [`\\frac{${len(upperSpec)} - ${mean}}{3 \\times ${sigma}}`] : []),
      ...(lowerSpec !== undefined ? [`\\frac{${mean} - ${len(lowerSpec)}}{3 \\times ${sigma}}`] : []),
    ];
    steps.push(
      {
        label: 'Cpk',
        latex: `C_{pk} = \\min\\left(${sides.join(',\\ ')}\\right) = ${formatNumber(capability.cpk, 3)}`,
        value: formatNumber(capability.cpk, 3),
      },
      {
        label: 'Predicted out of spec (normal model)',
        latex: `\\text{ppm} = 10^6\\left[\\Phi\\left(\\frac{LSL - \\bar Y}{\\sigma}\\right) + 1 - \\Phi\\left(\\frac{USL - \\bar Y}{\\sigma}\\right)\\right] = ${formatPpm(roundSignificant(capability.ppmTotal, 3))}`,
        value: `${formatPpm(roundSignificant(capability.ppmTotal, 3))} ppm`,
      },
    );
  }
  return steps;
}

function abbreviate(terms: string[]): string[] {
  return terms.length <= maxTermsShown ? terms : [...terms.slice(0, maxTermsShown - 2), '\\cdots', terms[terms.length - 1]!];
}

function formatPpm(value: number): string {
  return value === 0 || value >= 1e-4 ? formatNumber(value, 6) : value.toExponential(2);
}

function roundSignificant(value: number, digits: number): number {
  if (value === 0 || !Number.isFinite(value)) return value;
  return Number(value.toPrecision(digits));
}
