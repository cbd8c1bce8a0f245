import { type ArgumentMetadata, type PipeTransform } from '@nestjs/common';
import { type z } from 'zod';
import { AppException } from '../errors/app.exception.js';
import { validationFields } from './validation-fields.js';

export class ZodValidationPipe<T extends z.ZodType> implements PipeTransform<unknown, z.output<T>> {
  constructor(private readonly schema: T) {}

  transform(value: unknown, metadata: ArgumentMetadata): z.output<T> {
    if (metadata.type === 'body' && value === undefined) {
      throw new AppException(400, 'VALIDATION_FAILED', 'Send a JSON body with Content-Type: application/json.', { _: 'Body is missing' });
    }
    const result = this.schema.safeParse(value);
    if (!result.success) {
      throw new AppException(400, 'VALIDATION_FAILED', 'Some fields need attention.', validationFields(result.error));
    }
    return result.data;
  }
}
