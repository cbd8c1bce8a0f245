import { z } from 'zod';

export const iso2768LinearClasses = ['f', 'm', 'c', 'v'] as const;
export const iso2768LinearClassSchema = z.enum(iso2768LinearClasses, { message: 'Tolerance class must be f, m, c or v (ISO 2768-1)' });
export type Iso2768LinearClass = z.infer<typeof iso2768LinearClassSchema>;

export const iso2768GeometricClasses = ['H', 'K', 'L'] as const;
export const iso2768GeometricClassSchema = z.enum(iso2768GeometricClasses, { message: 'Tolerance class must be H, K or L (ISO 2768-2)' });
export type Iso2768GeometricClass = z.infer<typeof iso2768GeometricClassSchema>;

/** The title-block note, such as "ISO 2768-mK"; parsed by the engine, which reports what it cannot read. */
const designationSchema = z
  .string({ message: 'Designation must be text such as ISO 2768-mK' })
  .max(40, 'Designation is too long: write it as ISO 2768-mK');

function positiveLength(label: string) {
  return z.number({ message: `${label} must be a number` }).positive(`${label} must be greater than zero`);
}

export const iso2768LinearFeatures = ['linear', 'radius-chamfer'] as const;

export const iso2768InputSchema = z
  .object({
    nominalSize: positiveLength('Nominal size'),
    /** A linear size (default) or the height of an external radius or chamfer (ISO 2768-1 Tables 1 and 2). */
    feature: z.enum(iso2768LinearFeatures, { message: 'Feature must be linear or radius-chamfer' }).default('linear'),
    class: iso2768LinearClassSchema.optional(),
    designation: designationSchema.optional(),
  })
  .superRefine((inputs, ctx) => {
    if (inputs.class === undefined && (inputs.designation === undefined || inputs.designation.trim() === '')) {
      ctx.addIssue({ code: 'custom', path: ['class'], message: 'Give a tolerance class (f, m, c or v) or the title-block designation such as ISO 2768-mK' });
    }
  });
export type Iso2768Input = z.input<typeof iso2768InputSchema>;

export const iso2768AngularInputSchema = z
  .object({
    /** Length of the shorter leg of the angle, in the request's unit. */
    shorterLegLength: positiveLength('Shorter leg length'),
    class: iso2768LinearClassSchema.optional(),
    designation: designationSchema.optional(),
  })
  .superRefine((inputs, ctx) => {
    if (inputs.class === undefined && (inputs.designation === undefined || inputs.designation.trim() === '')) {
      ctx.addIssue({ code: 'custom', path: ['class'], message: 'Give a tolerance class (f, m, c or v) or the title-block designation such as ISO 2768-mK' });
    }
  });
export type Iso2768AngularInput = z.input<typeof iso2768AngularInputSchema>;

export const iso2768GeometricCharacteristics = ['straightness', 'flatness', 'perpendicularity', 'symmetry', 'circular-run-out'] as const;

export const iso2768GeometricInputSchema = z
  .object({
    characteristic: z.enum(iso2768GeometricCharacteristics, {
      message: 'Characteristic must be straightness, flatness, perpendicularity, symmetry or circular-run-out',
    }),
    /**
     * Straightness/flatness: length of the line or longer side of the surface; perpendicularity: the
     * shorter side; symmetry: the longer of the two features. Not used for circular run-out.
     */
    length: positiveLength('Length').optional(),
    class: iso2768GeometricClassSchema.optional(),
    designation: designationSchema.optional(),
  })
  .superRefine((inputs, ctx) => {
    if (inputs.class === undefined && (inputs.designation === undefined || inputs.designation.trim() === '')) {
      ctx.addIssue({ code: 'custom', path: ['class'], message: 'Give a tolerance class (H, K or L) or the title-block designation such as ISO 2768-mK' });
    }
    if (inputs.characteristic !== 'circular-run-out' && inputs.length === undefined) {
      ctx.addIssue({ code: 'custom', path: ['length'], message: `Give the length that selects the ${inputs.characteristic} tolerance` });
    }
  });
export type Iso2768GeometricInput = z.input<typeof iso2768GeometricInputSchema>;
