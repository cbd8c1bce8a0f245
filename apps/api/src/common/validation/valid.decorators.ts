import { Body, Param, Query } from '@nestjs/common';
import { type z } from 'zod';
import { ZodValidationPipe } from './zod-validation.pipe.js';

export const API_INPUTS = 'limitbook:api-inputs';

export interface ApiInputs {
  body?: z.ZodType;
  query?: z.ZodType;
  params?: z.ZodType;
}

/** Remembers the schema on the handler so the OpenAPI document and the input tests read the very schema that validates. */
function remember(target: object, key: string | symbol | undefined, part: keyof ApiInputs, schema: z.ZodType): void {
  if (key === undefined) throw new Error('Validation decorators belong on handler parameters');
  const handler = (target as Record<string | symbol, object>)[key]!;
  const inputs: ApiInputs = { ...(Reflect.getMetadata(API_INPUTS, handler) as ApiInputs | undefined), [part]: schema };
  Reflect.defineMetadata(API_INPUTS, inputs, handler);
}

/** The request body, parsed with a contracts schema; a failure becomes a 400 with field messages. */
export function ValidBody(schema: z.ZodType): ParameterDecorator {
  return (target, key, index) => {
    remember(target, key, 'body', schema);
    Body(new ZodValidationPipe(schema))(target, key, index);
  };
}

export function ValidQuery(schema: z.ZodType): ParameterDecorator {
  return (target, key, index) => {
    remember(target, key, 'query', schema);
    Query(new ZodValidationPipe(schema))(target, key, index);
  };
}

export function ValidParams(schema: z.ZodType): ParameterDecorator {
  return (target, key, index) => {
    remember(target, key, 'params', schema);
    Param(new ZodValidationPipe(schema))(target, key, index);
  };
}

export function inputsOf(handler: object): ApiInputs {
  return (Reflect.getMetadata(API_INPUTS, handler) as ApiInputs | undefined) ?? {};
}
