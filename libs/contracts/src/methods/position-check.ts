import { z } from 'zod';
import { featureTypeSchema, refineLimitOrder, sizeLimitSchema, toleranceModifierSchema, toleranceSchema } from './feature-boundary.js';
import { datumModifierSchema } from './wall-thickness.js';

/** Upper bound on measured features in one position check (a large plate pattern; CMM reports run to a few hundred). */
export const maxPositionFeatures = 500;
export const maxPositionLabelLength = 40;

const coordinateSchema = (label: string) => z.number({ message: `${label} must be a number` }).finite(`${label} must be finite`);

/** One measured feature of the pattern: where the drawing puts it, where it was found, and its actual size. */
export const positionFeatureSchema = z.strictObject({
  label: z
    .string({ message: 'Label is required' })
    .trim()
    .min(1, 'Label is required')
    .max(maxPositionLabelLength, `Label is at most ${maxPositionLabelLength} characters`)
    .describe('Name of the feature on the drawing or the measuring report, e.g. H1. Kept as plain text.'),
  basicX: coordinateSchema('Basic X').describe('Basic (true position) X coordinate from the datum reference frame, in the request unit.'),
  basicY: coordinateSchema('Basic Y').describe('Basic (true position) Y coordinate from the datum reference frame, in the request unit.'),
  measuredX: coordinateSchema('Measured X').describe('Measured X coordinate of the feature axis, in the request unit.'),
  measuredY: coordinateSchema('Measured Y').describe('Measured Y coordinate of the feature axis, in the request unit.'),
  actualSize: sizeLimitSchema('Actual size').describe('Measured actual mating size of the feature, in the request unit.'),
});
export type PositionFeature = z.output<typeof positionFeatureSchema>;

/**
 * The primary datum feature of size the pattern is located to. Leave every size empty when the
 * pattern is located to planes only (no datum feature shift is then available).
 */
const positionDatumSchema = z
  .strictObject({
    featureType: featureTypeSchema.default('internal').describe('Internal (a pilot bore) or external (a spigot).'),
    lowerLimit: sizeLimitSchema('Lower limit').nullish().describe('Lower size limit of the datum feature, in the request unit.'),
    upperLimit: sizeLimitSchema('Upper limit').nullish().describe('Upper size limit of the datum feature, in the request unit.'),
    actualSize: sizeLimitSchema('Actual size').nullish().describe('Measured actual mating size of the datum feature, in the request unit.'),
  })
  .superRefine((datum, ctx) => {
    const keys = ['lowerLimit', 'upperLimit', 'actualSize'] as const;
    const given = keys.filter((key) => datum[key] !== undefined && datum[key] !== null);
    if (given.length > 0 && given.length < keys.length) {
      for (const key of keys) {
        if (!given.includes(key)) {
          ctx.addIssue({ code: 'custom', path: [key], message: 'Give the datum feature’s limits and actual size, or leave all three empty' });
        }
      }
    }
    refineLimitOrder(datum, ctx);
  });
export type PositionDatum = z.output<typeof positionDatumSchema>;

export const positionCheckInputSchema = z
  .strictObject({
    featureType: featureTypeSchema.describe('Internal features (holes) or external features (pins, studs) of the pattern.'),
    lowerLimit: sizeLimitSchema('Lower limit').describe('Lower size limit of the pattern’s features, in the request unit.'),
    upperLimit: sizeLimitSchema('Upper limit').describe('Upper size limit of the pattern’s features, in the request unit.'),
    positionTolerance: toleranceSchema('Position tolerance').describe('Position tolerance of each feature, a diameter, in the request unit.'),
    toleranceModifier: toleranceModifierSchema.describe('Material condition the position tolerance applies at.'),
    datum: positionDatumSchema
      .nullish()
      .describe('Primary datum feature of size the pattern is located to; leave its sizes empty for a frame of planes.'),
    datumModifier: datumModifierSchema
      .nullish()
      .describe('How the datum feature of size is referenced: MMB or LMB allow datum feature shift, RMB none.'),
    features: z
      .array(positionFeatureSchema, { message: 'Features must be a list' })
      .min(1, 'Add at least one measured feature')
      .max(maxPositionFeatures, `At most ${maxPositionFeatures} features per check`),
  })
  .superRefine((inputs, ctx) => {
    refineLimitOrder(inputs, ctx);
    const datumGiven = typeof inputs.datum?.actualSize === 'number';
    if (datumGiven && (inputs.datumModifier === undefined || inputs.datumModifier === null)) {
      ctx.addIssue({ code: 'custom', path: ['datumModifier'], message: 'Datum modifier (MMB, LMB or RMB) is required with a datum feature of size' });
    }
    if (!datumGiven && (inputs.datumModifier === 'MMB' || inputs.datumModifier === 'LMB')) {
      ctx.addIssue({
        code: 'custom',
        path: ['datumModifier'],
        message: `${inputs.datumModifier} needs a datum feature of size: enter its limits and actual size, or choose none`,
      });
    }
  });
export type PositionCheckInput = z.output<typeof positionCheckInputSchema>;
