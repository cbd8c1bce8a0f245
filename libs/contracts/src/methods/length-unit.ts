import { z } from 'zod';

export const lengthUnits = ['mm', 'in'] as const;
export const lengthUnitSchema = z.enum(lengthUnits, { message: 'Unit must be mm or in' });
export type LengthUnit = z.infer<typeof lengthUnitSchema>;
