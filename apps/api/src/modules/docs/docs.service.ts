import { Injectable } from '@nestjs/common';
import { DiscoveryService, MetadataScanner, Reflector } from '@nestjs/core';
import apiPackage from '../../../package.json' with { type: 'json' };
import { collectRoutes } from '../../common/openapi/route-catalog.js';
import { buildOpenApiDocument } from './openapi-document.js';

@Injectable()
export class DocsService {
  private document: Record<string, unknown> | undefined;

  constructor(
    private readonly discovery: DiscoveryService,
    private readonly scanner: MetadataScanner,
    private readonly reflector: Reflector,
  ) {}

  openApi(): Record<string, unknown> {
    this.document ??= buildOpenApiDocument(collectRoutes(this.discovery, this.scanner, this.reflector), apiPackage.version);
    return this.document;
  }
}
