import { z } from 'zod';

/** A tolerance class as written on a drawing: deviation letter(s) and grade, e.g. "H7", "js6", "ZC11". */
function toleranceClassText(side: 'Hole' | 'Shaft', example: string) {
  return z
    .string({ message: `${side} tolerance class must be text such as ${example}` })
    .max(8, `${side} tolerance class is too long: write it as ${example}`);
}

export const iso286FitInputSchema = z
  .object({
    /** Nominal size in the request's unit; the 0–3150 mm bound is checked after conversion to mm. */
    nominalSize: z.number({ message: 'Nominal size must be a number' }).positive('Nominal size must be greater than zero'),
    hole: toleranceClassText('Hole', 'H7').optional(),
    shaft: toleranceClassText('Shaft', 'g6').optional(),
  })
  .superRefine((inputs, ctx) => {
    const blank = (value: string | undefined) => value === undefined || value.trim() === '';
    if (blank(inputs.hole) && blank(inputs.shaft)) {
      ctx.addIssue({ code: 'custom', path: ['hole'], message: 'Give a hole class (such as H7), a shaft class (such as g6), or both' });
    }
  });
export type Iso286FitInput = z.infer<typeof iso286FitInputSchema>;

export const iso286FitTypes = ['clearance', 'transition', 'interference'] as const;
export type Iso286FitType = (typeof iso286FitTypes)[number];
