import { z } from 'zod';

/** Upper bound on Monte Carlo trials for one evaluation. */
export const maxStackTrials = 2_000_000;
/** Upper bound on contributors in one stack. */
export const maxStackContributors = 100;
/** Upper bound on trials × contributors, the Monte Carlo's work (2·10⁶ trials of 20 contributors, 4·10⁵ of 100). */
export const maxStackSamples = 40_000_000;
export const defaultStackTrials = 100_000;
export const defaultStackSeed = 1;

export const stackDistributions = ['normal', 'uniform', 'triangular'] as const;
export const stackAcceptanceCriteria = ['worst-case', 'rss', 'inflated-rss'] as const;

const finiteLength = (label: string) => z.number({ message: `${label} must be a number` }).finite(`${label} must be finite`);

const toleranceMagnitude = (label: string, sign: '+' | '−') =>
  finiteLength(label).refine((value) => value >= 0, {
    message: `${label} is a magnitude: enter it without a sign (a limit of ${sign}0.05 is entered as 0.05)`,
  });

export const stackContributorSchema = z
  .strictObject({
    name: z.string({ message: 'Name is required' }).trim().min(1, 'Name is required').max(80, 'Name is at most 80 characters'),
    sense: z.union([z.literal(1), z.literal(-1)], { message: 'Sense must be 1 (adds to the gap) or -1 (subtracts from it)' }),
    nominal: finiteLength('Nominal').describe('Nominal length, in the request unit.'),
    plusTol: toleranceMagnitude('Plus tolerance', '+').describe(
      'Upper deviation as a non-negative magnitude: the upper limit is nominal + plusTol.',
    ),
    minusTol: toleranceMagnitude('Minus tolerance', '−').describe(
      'Lower deviation as a non-negative magnitude: the lower limit is nominal − minusTol (−0.05 is entered as 0.05).',
    ),
    distribution: z
      .enum(stackDistributions, { message: 'Distribution must be normal, uniform or triangular' })
      .default('normal')
      .describe('How sizes spread between the limits; normal by default.'),
    cpk: z
      .number({ message: 'Cpk must be a number' })
      .finite()
      .positive('Cpk must be above zero')
      .max(10, 'Cpk above 10 is not a meaningful process capability')
      .optional()
      .describe('Normal only: capability of the centred process, σ = half the tolerance band / (3·Cpk). Default 1 (band = ±3σ).'),
    sigma: z
      .number({ message: 'Sigma must be a number' })
      .finite()
      .positive('Sigma must be above zero')
      .optional()
      .describe('Normal only: the standard deviation in the request unit, instead of Cpk.'),
  })
  .superRefine((contributor, context) => {
    if (contributor.distribution !== 'normal') {
      for (const key of ['cpk', 'sigma'] as const) {
        if (contributor[key] !== undefined) {
          context.addIssue({ code: 'custom', path: [key], message: `${key === 'cpk' ? 'Cpk' : 'Sigma'} applies to normal contributors only` });
        }
      }
    }
    if (contributor.cpk !== undefined && contributor.sigma !== undefined) {
      context.addIssue({ code: 'custom', path: ['sigma'], message: 'Give either Cpk or sigma, not both' });
    }
  });
export type StackContributor = z.output<typeof stackContributorSchema>;

export const stack1dInputSchema = z
  .strictObject({
    contributors: z
      .array(stackContributorSchema, { message: 'Contributors must be a list' })
      .min(1, 'Add at least one contributor')
      .max(maxStackContributors, `At most ${maxStackContributors} contributors`),
    lowerSpec: finiteLength('Lower spec limit').optional().describe('Lowest acceptable value of the resulting dimension.'),
    upperSpec: finiteLength('Upper spec limit').optional().describe('Highest acceptable value of the resulting dimension.'),
    acceptance: z
      .enum(stackAcceptanceCriteria, { message: 'Acceptance must be worst-case, rss or inflated-rss' })
      .default('worst-case')
      .describe('Which range must lie within the spec limits for a pass; worst case by default.'),
    trials: z
      .number({ message: 'Trials must be a number' })
      .int('Trials must be a whole number')
      .min(1_000, 'At least 1 000 Monte Carlo trials')
      .max(maxStackTrials, `At most ${maxStackTrials.toLocaleString('en-US')} Monte Carlo trials`)
      .default(defaultStackTrials)
      .describe('Monte Carlo trials; default 100 000.'),
    seed: z
      .number({ message: 'Seed must be a number' })
      .int('Seed must be a whole number')
      .min(0, 'Seed must be 0 or more')
      .max(0xffff_ffff, 'Seed must fit in 32 bits')
      .default(defaultStackSeed)
      .describe('Seed of the Monte Carlo random stream; the same seed gives the same result.'),
  })
  .superRefine((inputs, context) => {
    if (inputs.lowerSpec !== undefined && inputs.upperSpec !== undefined && inputs.lowerSpec >= inputs.upperSpec) {
      context.addIssue({ code: 'custom', path: ['lowerSpec'], message: 'Lower spec limit must be below the upper spec limit' });
    }
    if (inputs.trials * inputs.contributors.length > maxStackSamples) {
      const allowed = Math.floor(maxStackSamples / inputs.contributors.length);
      context.addIssue({
        code: 'custom',
        path: ['trials'],
        message: `Too much work: with ${inputs.contributors.length} contributors at most ${allowed.toLocaleString('en-US')} trials`,
      });
    }
  });
export type Stack1dInputs = z.output<typeof stack1dInputSchema>;
export type Stack1dRequestInputs = z.input<typeof stack1dInputSchema>;
