import { z } from 'zod';

const optionalLength = (label: string) => z.number({ message: `${label} must be a number` }).nullish();

const solvableQuantities = {
  holeSize: 'Hole size',
  fastenerSize: 'Fastener size',
  positionTolerance: 'Position tolerance',
} as const;
export type FastenerQuantity = keyof typeof solvableQuantities;
export const fastenerQuantities = Object.keys(solvableQuantities) as FastenerQuantity[];

const isGiven = (value: unknown): value is number => typeof value === 'number';

/** Exactly one of hole size, fastener size and position tolerance is left empty; the method solves for it. */
function refineOneUnknown(inputs: Partial<Record<FastenerQuantity, number | null>>, ctx: z.RefinementCtx): void {
  const missing = fastenerQuantities.filter((key) => !isGiven(inputs[key]));
  if (missing.length === 0) {
    for (const key of fastenerQuantities) {
      ctx.addIssue({ code: 'custom', path: [key], message: 'Leave exactly one of hole size, fastener size and position tolerance empty: it is the value solved for' });
    }
  } else if (missing.length > 1) {
    for (const key of missing) {
      ctx.addIssue({ code: 'custom', path: [key], message: `${solvableQuantities[key]} is required: only one of hole size, fastener size and position tolerance may be left empty` });
    }
  }
  for (const key of ['holeSize', 'fastenerSize'] as const) {
    const value = inputs[key];
    if (isGiven(value) && value <= 0) ctx.addIssue({ code: 'custom', path: [key], message: `${solvableQuantities[key]} must be greater than zero` });
  }
  const tolerance = inputs.positionTolerance;
  if (isGiven(tolerance) && tolerance < 0) ctx.addIssue({ code: 'custom', path: ['positionTolerance'], message: 'Position tolerance must not be negative' });
}

export const fastenerFloatingInputSchema = z
  .object({
    holeSize: optionalLength('Hole size').describe('H: MMC (smallest size) of the clearance hole; leave empty to solve for it'),
    fastenerSize: optionalLength('Fastener size').describe('F: MMC (largest size) of the fastener; leave empty to solve for it'),
    positionTolerance: optionalLength('Position tolerance').describe('T: position tolerance at MMC (a diameter) of each part; leave empty to solve for it'),
  })
  .superRefine(refineOneUnknown);
export type FastenerFloatingInput = z.infer<typeof fastenerFloatingInputSchema>;

export const fastenerFixedInputSchema = z
  .object({
    holeSize: optionalLength('Hole size').describe('H: MMC (smallest size) of the clearance hole; leave empty to solve for it'),
    fastenerSize: optionalLength('Fastener size').describe('F: MMC (largest size) of the fastener; leave empty to solve for it'),
    positionTolerance: optionalLength('Position tolerance').describe('T1: position tolerance at MMC of the clearance holes; leave empty to solve for it'),
    toleranceThreaded: optionalLength('Threaded part tolerance').describe('T2: position tolerance at MMC of the fixed (threaded or press-fit) part; empty means equal to T1'),
    projection: optionalLength('Projection').describe('P: maximum projection of the fastener above the fixed part; only where the fixed part has no projected tolerance zone'),
    engagementDepth: optionalLength('Engagement depth').describe('D: minimum thread engagement or thickness of the fixed part; given together with the projection'),
  })
  .superRefine((inputs, ctx) => {
    refineOneUnknown(inputs, ctx);
    if (isGiven(inputs.toleranceThreaded) && inputs.toleranceThreaded < 0) {
      ctx.addIssue({ code: 'custom', path: ['toleranceThreaded'], message: 'Threaded part tolerance must not be negative' });
    }
    const projectionGiven = isGiven(inputs.projection);
    const depthGiven = isGiven(inputs.engagementDepth);
    if (projectionGiven !== depthGiven) {
      const missing = projectionGiven ? 'engagementDepth' : 'projection';
      ctx.addIssue({ code: 'custom', path: [missing], message: 'Give both projection and engagement depth (no projected tolerance zone) or neither (projected tolerance zone)' });
    }
    if (projectionGiven && (inputs.projection as number) < 0) {
      ctx.addIssue({ code: 'custom', path: ['projection'], message: 'Projection must not be negative' });
    }
    if (depthGiven && (inputs.engagementDepth as number) <= 0) {
      ctx.addIssue({ code: 'custom', path: ['engagementDepth'], message: 'Engagement depth must be greater than zero' });
    }
  });
export type FastenerFixedInput = z.infer<typeof fastenerFixedInputSchema>;
