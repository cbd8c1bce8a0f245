import { z } from 'zod';

export const uuidSchema = z.uuid({ message: 'Must be a valid id' });
export const idParamSchema = z.strictObject({ id: uuidSchema });
