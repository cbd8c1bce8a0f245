import { z } from 'zod';

export const featureTypes = ['internal', 'external'] as const;
export const featureTypeSchema = z.enum(featureTypes, { message: 'Feature type must be internal or external' });
export type FeatureType = z.infer<typeof featureTypeSchema>;

export const toleranceModifiers = ['MMC', 'LMC', 'RFS'] as const;
export const toleranceModifierSchema = z.enum(toleranceModifiers, { message: 'Modifier must be MMC, LMC or RFS' });
export type ToleranceModifier = z.infer<typeof toleranceModifierSchema>;

/** A produced size limit of a feature of size: a positive length in the request's unit. */
export function sizeLimitSchema(label: string) {
  return z.number({ message: `${label} must be a number` }).positive(`${label} must be greater than zero`);
}

/** A geometric or size tolerance: zero is allowed (zero tolerance at MMC), negative is not. */
export function toleranceSchema(label: string) {
  return z.number({ message: `${label} must be a number` }).nonnegative(`${label} must not be negative`);
}

/** Adds the "lower limit above upper limit" message at `<prefix>lowerLimit` when both limits are numbers. */
export function refineLimitOrder(
  limits: { lowerLimit?: unknown; upperLimit?: unknown },
  ctx: z.RefinementCtx,
  path: (string | number)[] = [],
): void {
  const { lowerLimit, upperLimit } = limits;
  if (typeof lowerLimit === 'number' && typeof upperLimit === 'number' && lowerLimit > upperLimit) {
    ctx.addIssue({ code: 'custom', path: [...path, 'lowerLimit'], message: 'Lower limit must not exceed the upper limit' });
  }
}

export const featureBoundaryInputSchema = z
  .object({
    featureType: featureTypeSchema,
    lowerLimit: sizeLimitSchema('Lower limit'),
    upperLimit: sizeLimitSchema('Upper limit'),
    tolerance: toleranceSchema('Geometric tolerance'),
    modifier: toleranceModifierSchema,
  })
  .superRefine((inputs, ctx) => refineLimitOrder(inputs, ctx));
export type FeatureBoundaryInput = z.infer<typeof featureBoundaryInputSchema>;
