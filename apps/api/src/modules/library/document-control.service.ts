import { Inject, Injectable, Logger } from '@nestjs/common';
import {
  type ApproveRequest,
  type Page,
  type PageRevision,
  type RevisionCompare,
  type RevisionHistory,
  type SendBackRequest,
  type SubmitForReviewRequest,
  type WatchedPageList,
  type WatchStatus,
} from '@limitbook/contracts';
import { type AuthUser } from '../../common/auth/auth-user.js';
import { APP_CONFIG, type ResolvedConfig } from '../../config/config.module.js';
import { type Executor } from '../../database/database.js';
import { type PageRevisionRow, type PageRow } from '../../database/schema/index.js';
import { AuditService } from '../audit/audit.service.js';
import { MailService } from '../mail/mail.service.js';
import { RecordsService } from '../records/records.service.js';
import { releaseNoticeMail, reviewRequestMail, sentBackMail } from '../mail/templates/document-control.mail.js';
import { compareBlocks, compareText } from './compare-revisions.js';
import { revisionPeopleIds, toCollectionRef, toHistoryEntry, toPageRevision } from './dto/library.dto.js';
import { visibleStates } from './library-access.js';
import { LibraryException } from './library.exception.js';
import { type PageContent } from './page-content.js';
import { PagesRepository } from './pages.repository.js';
import { PagesService } from './pages.service.js';
import { nextRevisionLetter, revisionLetterAt } from './revision-letter.js';

function storedContent(revision: PageRevisionRow): PageContent {
  return { document: revision.document, searchText: revision.searchText, searchCaptions: revision.searchCaptions };
}

/** Everyone who shaped a revision: none of them may approve it. */
function contributors(revision: PageRevisionRow): Set<string> {
  return new Set([revision.createdBy, revision.updatedBy, revision.submittedBy].filter((id): id is string => id !== null));
}

/**
 * Review and release of page revisions (draft → in review → released → superseded), their
 * history and comparison, restore, obsolescence and watching. Every state change is audited
 * in the transaction that makes it; mail goes out after it commits.
 */
const impactLogger = new Logger('ImpactCheck');

@Injectable()
export class DocumentControlService {
  constructor(
    private readonly repository: PagesRepository,
    private readonly pages: PagesService,
    private readonly audit: AuditService,
    private readonly mail: MailService,
    private readonly records: RecordsService,
    @Inject(APP_CONFIG) private readonly config: ResolvedConfig,
  ) {}

  async submit(actor: AuthUser, id: string, request: SubmitForReviewRequest): Promise<Page> {
    const reviewerIds = [...new Set(request.reviewerIds)];
    const reviewers = await this.repository.usersWithRoles(reviewerIds);
    if (reviewers.length !== reviewerIds.length) throw LibraryException.invalidReviewers('Every reviewer must be a user of Limitbook');
    if (reviewers.some((user) => user.role !== 'reviewer' && user.role !== 'admin')) throw LibraryException.invalidReviewers('Reviewers must have the reviewer or admin role');
    if (reviewers.some((user) => user.status !== 'active')) throw LibraryException.invalidReviewers('Reviewers must have an active account');
    if (reviewerIds.includes(actor.id)) throw LibraryException.invalidReviewers('You cannot review your own revision; pick someone else');

    const page = await this.repository.transaction(async (tx) => {
      const page = await this.repository.lockPage(id, tx);
      if (!page) throw LibraryException.of('page-not-found');
      const open = await this.repository.findDraft(id, tx);
      if (!open) throw this.pages.noOpenRevision(page);
      if (open.state !== 'draft') throw LibraryException.of('in-review');
      await this.repository.transition(
        open.id,
        'draft',
        { state: 'in_review', submittedAt: new Date(), submittedBy: actor.id, reviewerIds, submitNote: request.note || null, reviewComment: null },
        tx,
      );
      await this.audit.record(
        { actor, action: 'page.submitted', subjectType: 'page', subjectId: id, detail: { documentNumber: page.documentNumber, revisionId: open.id, reviewerIds, note: request.note ?? null } },
        tx,
      );
      return { page, title: open.title };
    });
    for (const reviewer of reviewers) {
      this.mail.dispatch({
        to: reviewer.email,
        ...reviewRequestMail({ documentNumber: page.page.documentNumber, title: page.title, url: this.pageUrl(page.page, '/review'), authorName: actor.name, note: request.note || null }),
      });
    }
    return this.pages.get(actor, id, 'draft');
  }

  /** The author takes a revision out of review, back to an editable draft. */
  async withdraw(actor: AuthUser, id: string): Promise<Page> {
    await this.repository.transaction(async (tx) => {
      const { page, open } = await this.lockInReview(id, tx);
      await this.repository.transition(open.id, 'in_review', { state: 'draft' }, tx);
      await this.audit.record({ actor, action: 'page.review_withdrawn', subjectType: 'page', subjectId: id, detail: { documentNumber: page.documentNumber, revisionId: open.id } }, tx);
    });
    return this.pages.get(actor, id, 'draft');
  }

  async sendBack(actor: AuthUser, id: string, request: SendBackRequest): Promise<Page> {
    const { page, open } = await this.repository.transaction(async (tx) => {
      const locked = await this.lockInReview(id, tx);
      await this.repository.transition(locked.open.id, 'in_review', { state: 'draft', reviewComment: request.comment }, tx);
      await this.audit.record(
        { actor, action: 'page.sent_back', subjectType: 'page', subjectId: id, detail: { documentNumber: locked.page.documentNumber, revisionId: locked.open.id, comment: request.comment } },
        tx,
      );
      return locked;
    });
    const authorId = open.submittedBy ?? open.createdBy;
    const [author] = authorId ? await this.repository.usersWithRoles([authorId]) : [];
    if (author && author.status === 'active') {
      this.mail.dispatch({
        to: author.email,
        ...sentBackMail({ documentNumber: page.documentNumber, title: open.title, url: this.pageUrl(page, '/edit'), reviewerName: actor.name, comment: request.comment }),
      });
    }
    return this.pages.get(actor, id, 'draft', true);
  }

  /** Releases the revision in review with the next letter; the release before it is superseded. */
  async approve(actor: AuthUser, id: string, request: ApproveRequest): Promise<Page> {
    const released = await this.repository.transaction(async (tx) => {
      const { page, open } = await this.lockInReview(id, tx);
      if (contributors(open).has(actor.id)) throw LibraryException.of('own-approval');
      if (open.version !== request.baseVersion) throw LibraryException.of('review-stale');
      const previous = page.currentPublishedRevisionId ? await this.repository.findRevision(page.currentPublishedRevisionId, tx) : undefined;
      const letter = previous?.revisionLetter
        ? nextRevisionLetter(previous.revisionLetter)
        : revisionLetterAt((await this.repository.listRevisions(id, ['released', 'superseded'], tx)).length + 1);
      const now = new Date();
      const released = await this.repository.transition(
        open.id,
        'in_review',
        { state: 'released', revisionLetter: letter, publishedAt: now, publishedBy: actor.id, reviewComment: request.comment || null },
        tx,
      );
      if (previous) await this.repository.transition(previous.id, 'released', { state: 'superseded', supersededAt: now }, tx);
      await this.repository.updatePage(id, { currentPublishedRevisionId: open.id }, tx);
      await this.audit.record(
        {
          actor,
          action: 'page.released',
          subjectType: 'page',
          subjectId: id,
          detail: { documentNumber: page.documentNumber, revisionId: open.id, revisionLetter: letter, comment: request.comment ?? null, supersededRevisionId: previous?.id ?? null },
        },
        tx,
      );
      const watchers = await this.repository.watchers(id, tx);
      return { page, revision: released!, watchers, previousId: previous?.id };
    });
    if (released.previousId) this.scheduleImpactCheck(id, released.previousId, released.revision.id, actor);
    for (const watcher of released.watchers) {
      if (watcher.id === actor.id) continue;
      this.mail.dispatch({
        to: watcher.email,
        ...releaseNoticeMail({
          documentNumber: released.page.documentNumber,
          title: released.revision.title,
          url: this.pageUrl(released.page, ''),
          revisionLetter: released.revision.revisionLetter!,
          approverName: actor.name,
        }),
      });
    }
    return this.pages.get(actor, id, 'published');
  }

  async history(user: AuthUser, id: string): Promise<RevisionHistory> {
    await this.requireVisiblePage(user, id);
    const rows = await this.repository.listRevisions(id, visibleStates(user.role));
    const people = await this.repository.peopleByIds(rows.flatMap(revisionPeopleIds));
    return { items: rows.map((row) => toHistoryEntry(row, people)) };
  }

  async revision(user: AuthUser, id: string, revisionId: string): Promise<PageRevision> {
    const row = await this.visibleRevision(user, id, revisionId);
    const people = await this.repository.peopleByIds(revisionPeopleIds(row));
    return toPageRevision(row, people);
  }

  async compare(user: AuthUser, id: string, fromId: string, toId: string): Promise<RevisionCompare> {
    const [from, to] = await Promise.all([this.visibleRevision(user, id, fromId), this.visibleRevision(user, id, toId)]);
    const ref = (row: PageRevisionRow) => ({ id: row.id, revisionLetter: row.revisionLetter, state: row.state, sequence: row.sequence });
    return {
      from: ref(from),
      to: ref(to),
      title: { from: from.title, to: to.title, changed: from.title !== to.title },
      text: compareText(from.document, to.document),
      blocks: compareBlocks(from.document, to.document),
    };
  }

  /** A new draft holding an earlier revision's title and body; refused while a revision is open. */
  async restore(actor: AuthUser, id: string, revisionId: string): Promise<Page> {
    await this.repository.transaction(async (tx) => {
      const page = await this.repository.lockPage(id, tx);
      if (!page) throw LibraryException.of('page-not-found');
      const source = await this.repository.findRevision(revisionId, tx);
      if (!source || source.pageId !== id) throw LibraryException.of('revision-not-found');
      if (source.state !== 'released' && source.state !== 'superseded') throw LibraryException.of('restore-not-released');
      if (await this.repository.findDraft(id, tx)) throw LibraryException.of('restore-open-revision');
      const draft = await this.repository.insertRevision(
        { pageId: id, documentNumber: page.documentNumber, state: 'draft', title: source.title, content: storedContent(source), userId: actor.id, restoredFromId: source.id },
        tx,
      );
      if (!draft) throw LibraryException.of('restore-open-revision');
      await this.repository.updatePage(id, {}, tx);
      await this.audit.record(
        {
          actor,
          action: 'page.restored',
          subjectType: 'page',
          subjectId: id,
          detail: { documentNumber: page.documentNumber, revisionId: draft.id, fromRevisionId: source.id, fromRevisionLetter: source.revisionLetter },
        },
        tx,
      );
    });
    return this.pages.get(actor, id, 'draft');
  }

  async obsolete(actor: AuthUser, id: string, reason: string): Promise<Page> {
    await this.repository.transaction(async (tx) => {
      const page = await this.repository.lockPage(id, tx);
      if (!page) throw LibraryException.of('page-not-found');
      if (page.obsoleteAt) throw LibraryException.of('already-obsolete');
      await this.repository.updatePage(id, { obsoleteAt: new Date(), obsoleteBy: actor.id, obsoleteReason: reason }, tx);
      await this.audit.record({ actor, action: 'page.obsoleted', subjectType: 'page', subjectId: id, detail: { documentNumber: page.documentNumber, reason } }, tx);
    });
    return this.pages.get(actor, id, undefined);
  }

  async reinstate(actor: AuthUser, id: string): Promise<Page> {
    await this.repository.transaction(async (tx) => {
      const page = await this.repository.lockPage(id, tx);
      if (!page) throw LibraryException.of('page-not-found');
      if (!page.obsoleteAt) throw LibraryException.of('not-obsolete');
      await this.repository.updatePage(id, { obsoleteAt: null, obsoleteBy: null, obsoleteReason: null }, tx);
      await this.audit.record(
        { actor, action: 'page.reinstated', subjectType: 'page', subjectId: id, detail: { documentNumber: page.documentNumber, obsoleteReason: page.obsoleteReason } },
        tx,
      );
    });
    return this.pages.get(actor, id, undefined);
  }

  async watch(user: AuthUser, id: string, watching: boolean): Promise<WatchStatus> {
    await this.requireVisiblePage(user, id);
    if (watching) await this.repository.watch(id, user.id);
    else await this.repository.unwatch(id, user.id);
    return { pageId: id, watching };
  }

  async watched(user: AuthUser): Promise<WatchedPageList> {
    const rows = await this.repository.watchedPages(user.id);
    return {
      items: rows.map((row) => ({
        id: row.page.id,
        documentNumber: row.page.documentNumber,
        title: row.title,
        collection: toCollectionRef(row.collection),
        revisionLetter: row.revisionLetter,
        releasedAt: row.releasedAt?.toISOString() ?? null,
        obsolete: row.page.obsoleteAt !== null,
        watchedAt: row.watchedAt.toISOString(),
      })),
    };
  }

  private async lockInReview(id: string, tx: Executor) {
    const page = await this.repository.lockPage(id, tx);
    if (!page) throw LibraryException.of('page-not-found');
    const open = await this.repository.findDraft(id, tx);
    if (!open) throw LibraryException.of(page.currentPublishedRevisionId ? 'released-immutable' : 'not-in-review');
    if (open.state !== 'in_review') throw LibraryException.of('not-in-review');
    return { page, open };
  }

  /** The page must exist for the caller: readers only know pages with a release. */
  private async requireVisiblePage(user: AuthUser, id: string): Promise<void> {
    await this.pages.get(user, id, undefined);
  }

  private async visibleRevision(user: AuthUser, id: string, revisionId: string): Promise<PageRevisionRow> {
    await this.requireVisiblePage(user, id);
    const row = await this.repository.findRevision(revisionId);
    if (!row || row.pageId !== id || !visibleStates(user.role).includes(row.state)) throw LibraryException.of('revision-not-found');
    return row;
  }

  /** Web addresses: the page, its review screen or its editor. */
  private pageUrl(page: PageRow, screen: '' | '/review' | '/edit'): string {
    return `${this.config.publicUrl}/standards/${encodeURIComponent(page.documentNumber)}${screen}`;
  }

  /** Re-evaluates the records made under the superseded release after the response is sent, so a release never waits on them. */
  private scheduleImpactCheck(pageId: string, fromRevisionId: string, toRevisionId: string, actor: AuthUser): void {
    setImmediate(() => {
      this.records.checkImpact(pageId, fromRevisionId, toRevisionId, actor).catch((error: unknown) => {
        impactLogger.error(`Impact check for page ${pageId} failed: ${error instanceof Error ? (error.stack ?? error.message) : String(error)}`);
      });
    });
  }
}
