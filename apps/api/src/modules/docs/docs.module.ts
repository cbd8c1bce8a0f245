import { Module } from '@nestjs/common';
import { DiscoveryModule } from '@nestjs/core';
import { DocsController } from './docs.controller.js';
import { DocsService } from './docs.service.js';

@Module({ imports: [DiscoveryModule], controllers: [DocsController], providers: [DocsService] })
export class DocsModule {}
