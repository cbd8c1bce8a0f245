import { type INestApplication, RequestMethod } from '@nestjs/common';
import { HTTP_CODE_METADATA, METHOD_METADATA, PATH_METADATA } from '@nestjs/common/constants.js';
import { DiscoveryService, MetadataScanner, Reflector } from '@nestjs/core';
import { type AccessRule, accessRuleOf } from '../auth/access-rule.js';
import { type ApiInputs, inputsOf } from '../validation/valid.decorators.js';
import { API_CONTRACT, type ApiContractOptions } from './api-contract.decorator.js';

export interface RouteEntry {
  method: string;
  /** Express-style path with the global prefix, e.g. `/api/users/:id`. */
  path: string;
  controller: string;
  handlerName: string;
  access: AccessRule;
  inputs: ApiInputs;
  contract: ApiContractOptions | undefined;
  status: number;
}

export const GLOBAL_PREFIX = 'api';

function joinPath(...parts: string[]): string {
  const joined = parts
    .flatMap((part) => part.split('/'))
    .filter(Boolean)
    .join('/');
  return `/${joined}`;
}

/** Every Nest route with its access rule and schemas, read from decorator metadata. */
export function collectRoutes(discovery: DiscoveryService, scanner: MetadataScanner, reflector: Reflector): RouteEntry[] {
  const entries: RouteEntry[] = [];
  for (const wrapper of discovery.getControllers()) {
    const controller = wrapper.metatype as (new (...args: never[]) => object) | undefined;
    if (!controller || !wrapper.instance) continue;
    const prototype = Object.getPrototypeOf(wrapper.instance) as Record<string, unknown>;
    const basePaths = [Reflect.getMetadata(PATH_METADATA, controller) ?? ''].flat() as string[];
    for (const name of scanner.getAllMethodNames(prototype)) {
      const handler = prototype[name] as (...args: unknown[]) => unknown;
      const methodPaths = Reflect.getMetadata(PATH_METADATA, handler) as string | string[] | undefined;
      const requestMethod = Reflect.getMetadata(METHOD_METADATA, handler) as RequestMethod | undefined;
      if (methodPaths === undefined || requestMethod === undefined) continue;
      const method = RequestMethod[requestMethod];
      const declaredStatus = Reflect.getMetadata(HTTP_CODE_METADATA, handler) as number | undefined;
      for (const base of basePaths) {
        for (const sub of [methodPaths].flat()) {
          entries.push({
            method,
            path: joinPath(GLOBAL_PREFIX, base, sub),
            controller: controller.name,
            handlerName: name,
            access: accessRuleOf(reflector, handler, controller),
            inputs: inputsOf(handler),
            contract: reflector.get<ApiContractOptions | undefined>(API_CONTRACT, handler),
            status: declaredStatus ?? (method === 'POST' ? 201 : 200),
          });
        }
      }
    }
  }
  return entries;
}

export function routesOf(app: INestApplication): RouteEntry[] {
  return collectRoutes(app.get(DiscoveryService), app.get(MetadataScanner), app.get(Reflector));
}
