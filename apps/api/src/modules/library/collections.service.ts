import { Injectable } from '@nestjs/common';
import { type Collection, type CollectionList, type CreateCollectionRequest, type UpdateCollectionRequest } from '@limitbook/contracts';
import { type AuthUser } from '../../common/auth/auth-user.js';
import { AuditService } from '../audit/audit.service.js';
import { CollectionsRepository } from './collections.repository.js';
import { toCollection } from './dto/library.dto.js';
import { seesDrafts } from './library-access.js';
import { LibraryException } from './library.exception.js';

@Injectable()
export class CollectionsService {
  constructor(
    private readonly repository: CollectionsRepository,
    private readonly audit: AuditService,
  ) {}

  async list(user: AuthUser): Promise<CollectionList> {
    const rows = await this.repository.list(!seesDrafts(user.role));
    return { items: rows.map(({ collection, pageCount }) => toCollection(collection, pageCount)) };
  }

  async create(actor: AuthUser, request: CreateCollectionRequest): Promise<Collection> {
    const created = await this.repository.insert({ key: request.key, name: request.name, description: request.description ?? '' });
    if (!created) throw LibraryException.of('collection-key-taken');
    await this.audit.record({ actor, action: 'collection.created', subjectType: 'collection', subjectId: created.id, detail: { key: created.key, name: created.name } });
    return toCollection(created, 0);
  }

  async update(actor: AuthUser, id: string, request: UpdateCollectionRequest): Promise<Collection> {
    const updated = await this.repository.update(id, request);
    if (!updated) throw LibraryException.of('collection-not-found');
    await this.audit.record({ actor, action: 'collection.updated', subjectType: 'collection', subjectId: id, detail: { ...request } });
    return toCollection(updated, await this.repository.countPages(id));
  }

  async delete(actor: AuthUser, id: string): Promise<void> {
    const existing = await this.repository.findById(id);
    if (!existing) throw LibraryException.of('collection-not-found');
    if ((await this.repository.countPages(id)) > 0) throw LibraryException.of('collection-not-empty');
    await this.repository.delete(id);
    await this.audit.record({ actor, action: 'collection.deleted', subjectType: 'collection', subjectId: id, detail: { key: existing.key } });
  }
}
