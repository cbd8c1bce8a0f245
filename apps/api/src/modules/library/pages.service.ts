import { Injectable } from '@nestjs/common';
import {
  type CreatePageRequest,
  type Page,
  type PageList,
  type PageListQuery,
  type PageViewQuery,
  type SaveDraftRequest,
  type TagList,
  type UpdatePageRequest,
} from '@limitbook/contracts';
import { type AuthUser } from '../../common/auth/auth-user.js';
import { type Executor } from '../../database/database.js';
import { type PageRevisionRow } from '../../database/schema/index.js';
import { AuditService } from '../audit/audit.service.js';
import { FilesService } from '../files/files.service.js';
import { CollectionsRepository } from './collections.repository.js';
import { revisionPeopleIds, toPage, toPageSummary } from './dto/library.dto.js';
import { seesDrafts, seesReviews } from './library-access.js';
import { LibraryException } from './library.exception.js';
import { emptyDocument, type PageContent, preparePageContent, referencedFileIds } from './page-content.js';
import { type PageWithCollection, PagesRepository } from './pages.repository.js';

const uuidPattern = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

function contentOrThrow(document: unknown): PageContent {
  const prepared = preparePageContent(document);
  if (!prepared.ok) throw LibraryException.invalidDocument(prepared.fields);
  return prepared.content;
}

function storedContent(revision: PageRevisionRow): PageContent {
  return { document: revision.document, searchText: revision.searchText, searchCaptions: revision.searchCaptions };
}

@Injectable()
export class PagesService {
  constructor(
    private readonly repository: PagesRepository,
    private readonly collections: CollectionsRepository,
    private readonly audit: AuditService,
    private readonly files: FilesService,
  ) {}

  async list(user: AuthUser, query: PageListQuery): Promise<PageList> {
    const drafts = seesDrafts(user.role);
    const { rows, total } = await this.repository.listPages({
      collectionKey: query.collection,
      tag: query.tag,
      publishedOnly: !drafts,
      includeObsolete: query.includeObsolete,
      sort: query.sort,
      limit: query.limit,
      offset: query.offset,
    });
    const people = await this.repository.peopleByIds(rows.map((row) => row.page.ownerId));
    return { items: rows.map((row) => toPageSummary(row, people, drafts)), total };
  }

  async tags(user: AuthUser): Promise<TagList> {
    return { items: await this.repository.listTags(!seesDrafts(user.role)) };
  }

  /**
   * Readers see the latest released revision only; a page never released does not exist for
   * them. Reviewers also see a revision in review, authors and admins the draft too.
   */
  async get(user: AuthUser, ref: string, view: PageViewQuery['view'], showOpen = false): Promise<Page> {
    const found = await this.repository.findPage(uuidPattern.test(ref) ? { id: ref } : { documentNumber: ref.toUpperCase() });
    if (!found) throw LibraryException.of('page-not-found');
    if (view === 'draft' && !showOpen && !seesReviews(user.role)) throw LibraryException.of('drafts-hidden');
    const published = found.page.currentPublishedRevisionId ? await this.repository.findRevision(found.page.currentPublishedRevisionId) : undefined;
    const open = await this.repository.findDraft(found.page.id);
    // `showOpen`: the answer to a reviewer's own decision shows the revision they decided on.
    const draft = open && (showOpen || seesDrafts(user.role) || (open.state === 'in_review' && seesReviews(user.role))) ? open : undefined;
    if (view === 'draft' && !draft) throw LibraryException.of(open ? 'drafts-hidden' : 'draft-not-found');
    if (!published && !draft) throw LibraryException.of('page-not-found');
    let shown: PageRevisionRow | undefined;
    if (view === 'draft') shown = draft!;
    else if (view === 'published') shown = published ?? LibraryException.throw('not-published');
    else shown = published ?? draft ?? LibraryException.throw('page-not-found');
    return this.view(user, found, shown, published, draft);
  }

  async create(actor: AuthUser, request: CreatePageRequest): Promise<Page> {
    const content = contentOrThrow(request.document ?? emptyDocument());
    const collection = await this.collections.findById(request.collectionId);
    if (!collection) throw LibraryException.of('collection-unknown');
    const ownerId = request.ownerId ?? actor.id;
    if (request.ownerId && !(await this.repository.userExists(request.ownerId))) throw LibraryException.of('owner-not-found');
    const documentNumber = request.documentNumber.toUpperCase();
    const { page, draft } = await this.repository.transaction(async (tx) => {
      const page = await this.repository.insertPage({ documentNumber, collectionId: collection.id, ownerId, tags: request.tags ?? [], createdBy: actor.id }, tx);
      if (!page) throw LibraryException.of('document-number-taken');
      const draft = await this.repository.insertRevision({ pageId: page.id, documentNumber, state: 'draft', title: request.title, content, userId: actor.id }, tx);
      await this.audit.record(
        { actor, action: 'page.created', subjectType: 'page', subjectId: page.id, detail: { documentNumber, title: request.title, collection: collection.key } },
        tx,
      );
      return { page, draft: draft! };
    });
    return this.view(actor, { page, collection }, draft, undefined, draft);
  }

  async update(actor: AuthUser, id: string, request: UpdatePageRequest): Promise<Page> {
    const found = await this.requirePage(id);
    if (request.collectionId && !(await this.collections.findById(request.collectionId))) throw LibraryException.of('collection-unknown');
    if (request.ownerId && !(await this.repository.userExists(request.ownerId))) throw LibraryException.of('owner-not-found');
    await this.repository.transaction(async (tx) => {
      await this.repository.updatePage(id, { collectionId: request.collectionId, tags: request.tags, ownerId: request.ownerId }, tx);
      await this.audit.record({ actor, action: 'page.updated', subjectType: 'page', subjectId: id, detail: { documentNumber: found.page.documentNumber, ...request } }, tx);
    });
    return this.get(actor, id, undefined);
  }

  /** A new draft of the next revision starts as a copy of the released one, which stays live. */
  async startDraft(actor: AuthUser, id: string): Promise<Page> {
    await this.repository.transaction(async (tx) => {
      const page = await this.repository.lockPage(id, tx);
      if (!page) throw LibraryException.of('page-not-found');
      const published = page.currentPublishedRevisionId ? await this.repository.findRevision(page.currentPublishedRevisionId, tx) : undefined;
      if (!published || (await this.repository.findDraft(id, tx))) throw LibraryException.of('draft-exists');
      const draft = await this.repository.insertRevision(
        { pageId: id, documentNumber: page.documentNumber, state: 'draft', title: published.title, content: storedContent(published), userId: actor.id },
        tx,
      );
      if (!draft) throw LibraryException.of('draft-exists');
      await this.repository.updatePage(id, {}, tx);
      await this.audit.record(
        { actor, action: 'page.draft_started', subjectType: 'page', subjectId: id, detail: { documentNumber: page.documentNumber, revisionId: draft.id, fromRevisionId: published.id } },
        tx,
      );
    });
    return this.get(actor, id, 'draft');
  }

  async saveDraft(actor: AuthUser, id: string, request: SaveDraftRequest): Promise<Page> {
    const found = await this.requirePage(id);
    // State first: a save aimed at released or in-review content is refused whatever it holds.
    const draft = await this.repository.findDraft(id);
    if (!draft) throw this.noOpenRevision(found.page);
    if (draft.state !== 'draft') throw LibraryException.of('in-review');
    const content = contentOrThrow(request.document);
    const saved = await this.repository.transaction(async (tx) => {
      const saved = await this.repository.saveDraft(
        draft.id,
        request.baseVersion,
        { documentNumber: found.page.documentNumber, title: request.title, content, userId: actor.id },
        tx,
      );
      if (saved) await this.repository.updatePage(id, {}, tx);
      return saved;
    });
    if (!saved) throw await this.staleDraft(id);
    return this.get(actor, id, 'draft');
  }

  /** Deleting the draft of a page never released deletes the page: nothing would be left of it. */
  async deleteDraft(actor: AuthUser, id: string): Promise<void> {
    await this.repository.transaction(async (tx) => {
      const page = await this.repository.lockPage(id, tx);
      if (!page) throw LibraryException.of('page-not-found');
      const draft = await this.repository.findDraft(id, tx);
      if (!draft) throw this.noOpenRevision(page);
      if (draft.state !== 'draft') throw LibraryException.of('in-review');
      await this.repository.deleteRevision(draft.id, tx);
      if (page.currentPublishedRevisionId) {
        await this.repository.updatePage(id, {}, tx);
        await this.audit.record({ actor, action: 'page.draft_deleted', subjectType: 'page', subjectId: id, detail: { documentNumber: page.documentNumber, revisionId: draft.id } }, tx);
      } else {
        await this.repository.deletePage(id, tx);
        await this.audit.record({ actor, action: 'page.deleted', subjectType: 'page', subjectId: id, detail: { documentNumber: page.documentNumber, title: draft.title } }, tx);
      }
    });
  }

  /** With no open revision, a change aimed at "the draft" would hit released content: refused. */
  noOpenRevision(page: { currentPublishedRevisionId: string | null }) {
    return LibraryException.of(page.currentPublishedRevisionId ? 'released-immutable' : 'draft-not-found');
  }

  private async requirePage(id: string, executor?: Executor): Promise<PageWithCollection> {
    const found = await this.repository.findPage({ id }, executor);
    if (!found) throw LibraryException.of('page-not-found');
    return found;
  }

  private async staleDraft(pageId: string) {
    const current = await this.repository.findDraft(pageId);
    if (!current) return LibraryException.of('draft-not-found');
    if (current.state !== 'draft') return LibraryException.of('in-review');
    const people = await this.repository.peopleByIds([current.updatedBy]);
    return LibraryException.staleDraft({
      version: current.version,
      updatedAt: current.updatedAt.toISOString(),
      updatedBy: current.updatedBy ? (people.get(current.updatedBy) ?? null) : null,
    });
  }

  private async view(
    viewer: AuthUser,
    found: PageWithCollection,
    shown: PageRevisionRow,
    published: PageRevisionRow | undefined,
    draft: PageRevisionRow | undefined,
  ): Promise<Page> {
    const [people, watching] = await Promise.all([
      this.repository.peopleByIds([found.page.ownerId, found.page.obsoleteBy, ...revisionPeopleIds(shown)]),
      this.repository.isWatching(found.page.id, viewer.id),
    ]);
    const fileUrls = this.files.signedUrls(viewer.id, referencedFileIds(shown.document));
    return toPage(found, shown, published, draft, people, fileUrls, watching);
  }
}
