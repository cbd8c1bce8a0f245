import { z } from 'zod';
import { featureTypeSchema, refineLimitOrder, sizeLimitSchema, toleranceModifierSchema, toleranceSchema } from './feature-boundary.js';

export const wallArrangements = ['coaxial', 'side-by-side'] as const;
export const wallArrangementSchema = z.enum(wallArrangements, { message: 'Arrangement must be coaxial or side-by-side' });
export type WallArrangement = z.infer<typeof wallArrangementSchema>;

export const datumModifiers = ['MMB', 'LMB', 'RMB'] as const;
export const datumModifierSchema = z.enum(datumModifiers, { message: 'Datum modifier must be MMB, LMB or RMB' });
export type DatumModifier = z.infer<typeof datumModifierSchema>;

/** A datum feature may be a feature of size or, for side-by-side walls, a plane (an edge face) without size. */
export const datumFeatureTypes = ['internal', 'external', 'plane'] as const;
export const datumFeatureTypeSchema = z.enum(datumFeatureTypes, { message: 'Datum feature type must be internal, external or plane' });
export type DatumFeatureType = z.infer<typeof datumFeatureTypeSchema>;

const locatedFeatureSchema = z
  .object({
    featureType: featureTypeSchema,
    lowerLimit: sizeLimitSchema('Lower limit'),
    upperLimit: sizeLimitSchema('Upper limit'),
  })
  .superRefine((feature, ctx) => refineLimitOrder(feature, ctx));

const datumFeatureSchema = z
  .object({
    featureType: datumFeatureTypeSchema,
    lowerLimit: sizeLimitSchema('Lower limit').nullish(),
    upperLimit: sizeLimitSchema('Upper limit').nullish(),
  })
  .superRefine((datum, ctx) => {
    for (const key of ['lowerLimit', 'upperLimit'] as const) {
      const given = datum[key] !== undefined && datum[key] !== null;
      if (datum.featureType === 'plane' && given) {
        ctx.addIssue({ code: 'custom', path: [key], message: 'A plane datum has no size: leave its limits empty' });
      }
      if (datum.featureType !== 'plane' && !given) {
        ctx.addIssue({ code: 'custom', path: [key], message: `${key === 'lowerLimit' ? 'Lower' : 'Upper'} limit is required for a datum feature of size` });
      }
    }
    refineLimitOrder(datum, ctx);
  });

export const wallThicknessInputSchema = z
  .object({
    arrangement: wallArrangementSchema,
    basicDistance: z
      .number({ message: 'Basic distance must be a number' })
      .nullish()
      .describe('Side by side only: basic distance from the datum feature axis (or datum plane) to the located feature axis'),
    feature: locatedFeatureSchema.describe('The located feature of size'),
    datum: datumFeatureSchema.describe('The datum feature it is located to: a feature of size, or a plane (side by side only)'),
    positionTolerance: toleranceSchema('Position tolerance').describe('Position tolerance of the located feature, a diameter'),
    toleranceModifier: toleranceModifierSchema,
    /** Required for a datum feature of size; a plane datum takes RMB or nothing. */
    datumModifier: datumModifierSchema.nullish(),
    /** Optional acceptance rule: the smallest wall the design allows. */
    requiredMinWall: z.number({ message: 'Required minimum wall must be a number' }).positive('Required minimum wall must be greater than zero').nullish(),
  })
  .superRefine((inputs, ctx) => {
    const distanceGiven = inputs.basicDistance !== undefined && inputs.basicDistance !== null;
    if (inputs.arrangement === 'side-by-side') {
      if (!distanceGiven) {
        ctx.addIssue({ code: 'custom', path: ['basicDistance'], message: 'Basic distance between the axes is required for side-by-side features' });
      } else if ((inputs.basicDistance as number) <= 0) {
        ctx.addIssue({ code: 'custom', path: ['basicDistance'], message: 'Basic distance must be greater than zero' });
      }
    } else if (distanceGiven) {
      ctx.addIssue({ code: 'custom', path: ['basicDistance'], message: 'Coaxial features share one axis: leave the basic distance empty' });
    }
    const datumType = inputs.datum?.featureType;
    if (datumType === 'plane') {
      if (inputs.datumModifier === 'MMB' || inputs.datumModifier === 'LMB') {
        ctx.addIssue({ code: 'custom', path: ['datumModifier'], message: 'A plane datum has no size, so MMB or LMB cannot apply: use RMB or leave it empty' });
      }
    } else if (datumType !== undefined && (inputs.datumModifier === undefined || inputs.datumModifier === null)) {
      ctx.addIssue({ code: 'custom', path: ['datumModifier'], message: 'Datum modifier (MMB, LMB or RMB) is required for a datum feature of size' });
    }
  });
export type WallThicknessInput = z.infer<typeof wallThicknessInputSchema>;
