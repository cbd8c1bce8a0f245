import { SetMetadata } from '@nestjs/common';
import { type z } from 'zod';

export const API_CONTRACT = 'limitbook:api-contract';

export interface ApiContractOptions {
  summary: string;
  description?: string;
  /** Omitted for 204 responses. */
  response?: z.ZodType;
  /** Defaults to application/json when `response` is set. */
  contentType?: string;
  status?: number;
  tag?: string;
}

/** Documents a route; request schemas come from @ValidBody/@ValidQuery/@ValidParams on the same handler. */
export const ApiContract = (options: ApiContractOptions): MethodDecorator => SetMetadata(API_CONTRACT, options);
