import { Inject, Injectable } from '@nestjs/common';
import {
  houseMethodPrefix,
  type ApproveRequest,
  type CreateMethodDesignRequest,
  type DesignDefinition,
  type MethodCompare,
  type MethodCompareQuery,
  type MethodDesign,
  type MethodDesignList,
  type MethodPreviewResponse,
  type MethodRevision,
  type MethodVersionList,
  type SendBackRequest,
  type SubmitForReviewRequest,
  type TestRun,
} from '@limitbook/contracts';
import { designExpressions, expressionTex, failingRowMessages, type DesignCheckReport, type DesignValues } from '@limitbook/engine';
import { type AuthUser } from '../../common/auth/auth-user.js';
import { APP_CONFIG, type ResolvedConfig } from '../../config/config.module.js';
import { type Executor } from '../../database/database.js';
import { type MethodDesignRevisionRow, type MethodDesignRow } from '../../database/schema/index.js';
import { AuditService } from '../audit/audit.service.js';
import { seesDrafts, seesReviews, visibleStates } from '../library/library-access.js';
import { MailService } from '../mail/mail.service.js';
import { reviewRequestMail, sentBackMail } from '../mail/templates/document-control.mail.js';
import { MethodsService } from '../methods/methods.service.js';
import { compareDefinitions } from './compare-definitions.js';
import { revisionPeopleIds, toDesignSummary, toMethodRevision } from './dto/method-designs.dto.js';
import { MethodDesignsException } from './method-designs.exception.js';
import { MethodDesignsRepository } from './method-designs.repository.js';

/** Everyone who shaped a version: none of them may approve it. */
function contributors(revision: MethodDesignRevisionRow): Set<string> {
  return new Set([revision.createdBy, revision.updatedBy, revision.submittedBy].filter((id): id is string => id !== null));
}

const prefixed = (prefix: string, fields: Record<string, string>) => Object.fromEntries(Object.entries(fields).map(([key, message]) => [`${prefix}${key}`, message]));

/**
 * In-house methods: design, preview, test table, review and release with versions (draft →
 * in review → released → superseded, the same rules as pages), comparison and restore. Every
 * evaluation of a definition runs in the evaluation workers with the formula sandbox's limits.
 */
@Injectable()
export class MethodDesignsService {
  constructor(
    private readonly repository: MethodDesignsRepository,
    private readonly methods: MethodsService,
    private readonly audit: AuditService,
    private readonly mail: MailService,
    @Inject(APP_CONFIG) private readonly config: ResolvedConfig,
  ) {}

  async list(user: AuthUser): Promise<MethodDesignList> {
    const [designs, revisions] = await Promise.all([this.repository.listDesigns(), this.repository.currentRevisions()]);
    const people = await this.repository.peopleByIds(designs.map((design) => design.ownerId));
    const items = designs.flatMap((design) => {
      const released = revisions.find((row) => row.designId === design.id && row.state === 'released');
      const open = this.visibleOpen(user, revisions.find((row) => row.designId === design.id && row.state !== 'released'));
      if (!released && !open) return [];
      return [toDesignSummary(design, released, open, people)];
    });
    return { items };
  }

  async get(user: AuthUser, slug: string): Promise<MethodDesign> {
    const design = await this.requireDesign(slug);
    const [released, openRow] = await Promise.all([this.repository.findReleased(design.id, null), this.repository.findOpen(design.id)]);
    const open = this.visibleOpen(user, openRow);
    if (!released && !open) throw MethodDesignsException.of(openRow ? 'drafts-hidden' : 'design-not-found');
    const people = await this.repository.peopleByIds([design.ownerId, ...(released ? revisionPeopleIds(released) : [])]);
    return { ...toDesignSummary(design, released, open, people), released: released ? toMethodRevision(slug, released, people) : null };
  }

  async create(actor: AuthUser, request: CreateMethodDesignRequest): Promise<MethodDesign> {
    const definition = request.definition as DesignDefinition;
    await this.requireEvaluable(definition, 'definition.');
    await this.repository.transaction(async (tx) => {
      const design = await this.repository.insertDesign({ slug: request.slug, ownerId: actor.id, createdBy: actor.id }, tx);
      if (!design) throw MethodDesignsException.of('slug-taken');
      await this.repository.insertRevision({ designId: design.id, state: 'draft', definition, createdBy: actor.id, updatedBy: actor.id }, tx);
      await this.audit.record({ actor, action: 'method.created', subjectType: 'method_design', subjectId: design.id, detail: { methodId: this.methodId(design), name: definition.name } }, tx);
    });
    return this.get(actor, request.slug);
  }

  /** The open revision (draft, or in review), with what still keeps it from being submitted. */
  async getDraft(user: AuthUser, slug: string): Promise<MethodRevision> {
    const design = await this.requireDesign(slug);
    const open = await this.repository.findOpen(design.id);
    if (!open) throw MethodDesignsException.of('draft-not-found');
    if (!this.visibleOpen(user, open)) throw MethodDesignsException.of('drafts-hidden');
    return this.revisionView(design, open, true);
  }

  /** A new draft of the next version starts as a copy of the latest release, which stays in use. */
  async startDraft(actor: AuthUser, slug: string): Promise<MethodRevision> {
    const { design, draft } = await this.repository.transaction(async (tx) => {
      const design = await this.lockDesign(slug, tx);
      if (await this.repository.findOpen(design.id, tx)) throw MethodDesignsException.of('draft-exists');
      const released = await this.repository.findReleased(design.id, null, tx);
      if (!released) throw MethodDesignsException.of('no-release');
      const draft = await this.repository.insertRevision({ designId: design.id, state: 'draft', definition: released.definition, createdBy: actor.id, updatedBy: actor.id }, tx);
      if (!draft) throw MethodDesignsException.of('draft-exists');
      await this.repository.touchDesign(design.id, tx);
      await this.audit.record(
        { actor, action: 'method.draft_started', subjectType: 'method_design', subjectId: design.id, detail: { methodId: this.methodId(design), fromVersion: released.methodVersion } },
        tx,
      );
      return { design, draft };
    });
    return this.revisionView(design, draft, true);
  }

  async saveDraft(actor: AuthUser, slug: string, baseVersion: number, definition: DesignDefinition): Promise<MethodRevision> {
    const design = await this.requireDesign(slug);
    // State first: a save aimed at released or in-review content is refused whatever it holds.
    const open = await this.requireDraft(design);
    const check = await this.check(definition);
    if (check.refused) throw MethodDesignsException.invalidDefinition('A formula uses something the evaluator does not allow.', prefixed('definition.', check.problems), check.tex);
    const saved = await this.repository.transaction(async (tx) => {
      const saved = await this.repository.saveDraft(open.id, baseVersion, definition, actor.id, tx);
      if (saved) await this.repository.touchDesign(design.id, tx);
      return saved;
    });
    if (!saved) {
      const current = await this.repository.findOpen(design.id);
      if (!current) throw MethodDesignsException.of('draft-not-found');
      if (current.state !== 'draft') throw MethodDesignsException.of('in-review');
      throw MethodDesignsException.staleDraft(current.version);
    }
    return this.revisionView(design, saved, false, check);
  }

  /** Deleting the draft of a method never released deletes the method: nothing would be left of it. */
  async deleteDraft(actor: AuthUser, slug: string): Promise<void> {
    await this.repository.transaction(async (tx) => {
      const design = await this.lockDesign(slug, tx);
      const open = await this.repository.findOpen(design.id, tx);
      if (!open) throw MethodDesignsException.of((await this.repository.findReleased(design.id, null, tx)) ? 'released-immutable' : 'draft-not-found');
      if (open.state !== 'draft') throw MethodDesignsException.of('in-review');
      await this.repository.deleteRevision(open.id, tx);
      const released = await this.repository.findReleased(design.id, null, tx);
      if (!released) await this.repository.deleteDesign(design.id, tx);
      await this.audit.record(
        { actor, action: released ? 'method.draft_deleted' : 'method.deleted', subjectType: 'method_design', subjectId: design.id, detail: { methodId: this.methodId(design) } },
        tx,
      );
    });
  }

  /** Evaluates a definition being written, with the TeX of each expression; problems come back as a 400 per field. */
  async preview(definition: DesignDefinition, values: DesignValues): Promise<MethodPreviewResponse> {
    const outcome = await this.methods.runDesignTask({ kind: 'evaluate', definition, values }, 'preview');
    const refusedFields = outcome.ok ? new Set<string>() : new Set(Object.entries(outcome.fields).filter(([, message]) => message.startsWith('Refused')).map(([field]) => field));
    const tex = expressionTex(designExpressions(definition).filter(({ field }) => !refusedFields.has(field)));
    if (!outcome.ok) {
      const fields = Object.fromEntries(Object.entries(outcome.fields).map(([key, message]) => [key.startsWith('values.') ? key : `definition.${key}`, message]));
      throw MethodDesignsException.invalidDefinition(outcome.message, fields, tex);
    }
    if (outcome.kind !== 'evaluate') throw new Error('Unexpected design outcome');
    const { outputs, verdict, warnings, steps } = outcome.evaluation;
    return { result: { method: 'preview', version: 0, unit: 'mm', outputs, ...(verdict ? { verdict } : {}), warnings, steps }, tex };
  }

  async runTests(user: AuthUser, slug: string): Promise<TestRun> {
    const design = await this.requireDesign(slug);
    const open = await this.repository.findOpen(design.id);
    if (!open) throw MethodDesignsException.of('draft-not-found');
    if (!this.visibleOpen(user, open)) throw MethodDesignsException.of('drafts-hidden');
    return this.testRun(open.definition);
  }

  async submit(actor: AuthUser, slug: string, request: SubmitForReviewRequest): Promise<MethodRevision> {
    const reviewerIds = [...new Set(request.reviewerIds)];
    const reviewers = await this.repository.usersWithRoles(reviewerIds);
    if (reviewers.length !== reviewerIds.length) throw MethodDesignsException.invalidReviewers('Every reviewer must be a user of Limitbook');
    if (reviewers.some((user) => user.role !== 'reviewer' && user.role !== 'admin')) throw MethodDesignsException.invalidReviewers('Reviewers must have the reviewer or admin role');
    if (reviewers.some((user) => user.status !== 'active')) throw MethodDesignsException.invalidReviewers('Reviewers must have an active account');
    if (reviewerIds.includes(actor.id)) throw MethodDesignsException.invalidReviewers('You cannot review your own version; pick someone else');

    const design = await this.requireDesign(slug);
    const open = await this.requireDraft(design);
    // Only a method whose every test row passes goes to review.
    if (open.definition.tests.length === 0) {
      throw MethodDesignsException.invalidDefinition('Add at least one test row from a worked example before submitting.', { tests: 'Add at least one test row from a worked example' });
    }
    const run = await this.testRun(open.definition);
    if (!run.pass) throw MethodDesignsException.invalidDefinition(`${run.failed} of ${run.rows.length} test rows fail; fix them before submitting.`, failingRowMessages(run));

    const submitted = await this.repository.transaction(async (tx) => {
      await this.lockDesign(slug, tx);
      const moved = await this.repository.transition(
        open.id,
        'draft',
        { state: 'in_review', submittedAt: new Date(), submittedBy: actor.id, reviewerIds, submitNote: request.note || null, reviewComment: null, version: open.version },
        tx,
      );
      // Edited or submitted meanwhile: the tested definition is no longer the one in the draft.
      if (!moved || moved.version !== open.version) throw MethodDesignsException.staleDraft(moved?.version ?? open.version);
      await this.audit.record(
        { actor, action: 'method.submitted', subjectType: 'method_design', subjectId: design.id, detail: { methodId: this.methodId(design), revisionId: open.id, reviewerIds, note: request.note ?? null } },
        tx,
      );
      return moved;
    });
    for (const reviewer of reviewers) {
      this.mail.dispatch({
        to: reviewer.email,
        ...reviewRequestMail({ documentNumber: this.methodId(design), title: open.definition.name, url: this.designUrl(design, '/review'), authorName: actor.name, note: request.note || null }),
      });
    }
    return this.revisionView(design, submitted, false);
  }

  async withdraw(actor: AuthUser, slug: string): Promise<MethodRevision> {
    const { design, row } = await this.repository.transaction(async (tx) => {
      const { design, open } = await this.lockInReview(slug, tx);
      const row = await this.repository.transition(open.id, 'in_review', { state: 'draft' }, tx);
      await this.audit.record({ actor, action: 'method.review_withdrawn', subjectType: 'method_design', subjectId: design.id, detail: { methodId: this.methodId(design), revisionId: open.id } }, tx);
      return { design, row: row! };
    });
    return this.revisionView(design, row, true);
  }

  async sendBack(actor: AuthUser, slug: string, request: SendBackRequest): Promise<MethodRevision> {
    const { design, row, open } = await this.repository.transaction(async (tx) => {
      const { design, open } = await this.lockInReview(slug, tx);
      const row = await this.repository.transition(open.id, 'in_review', { state: 'draft', reviewComment: request.comment }, tx);
      await this.audit.record(
        { actor, action: 'method.sent_back', subjectType: 'method_design', subjectId: design.id, detail: { methodId: this.methodId(design), revisionId: open.id, comment: request.comment } },
        tx,
      );
      return { design, row: row!, open };
    });
    const authorId = open.submittedBy ?? open.createdBy;
    const [author] = authorId ? await this.repository.usersWithRoles([authorId]) : [];
    if (author && author.status === 'active') {
      this.mail.dispatch({
        to: author.email,
        ...sentBackMail({ documentNumber: this.methodId(design), title: open.definition.name, url: this.designUrl(design, '/edit'), reviewerName: actor.name, comment: request.comment }),
      });
    }
    return this.revisionView(design, row, false);
  }

  /** Releases the version in review as the next version number; the release before it is superseded. */
  async approve(actor: AuthUser, slug: string, request: ApproveRequest): Promise<MethodRevision> {
    const { design, row } = await this.repository.transaction(async (tx) => {
      const { design, open } = await this.lockInReview(slug, tx);
      if (contributors(open).has(actor.id)) throw MethodDesignsException.of('own-approval');
      if (open.version !== request.baseVersion) throw MethodDesignsException.of('review-stale');
      const previous = await this.repository.findReleased(design.id, null, tx);
      const methodVersion = (await this.repository.maxMethodVersion(design.id, tx)) + 1;
      const now = new Date();
      if (previous) await this.repository.transition(previous.id, 'released', { state: 'superseded', supersededAt: now }, tx);
      const row = await this.repository.transition(open.id, 'in_review', { state: 'released', methodVersion, releasedAt: now, releasedBy: actor.id, reviewComment: request.comment || null }, tx);
      await this.repository.touchDesign(design.id, tx);
      await this.audit.record(
        {
          actor,
          action: 'method.released',
          subjectType: 'method_design',
          subjectId: design.id,
          detail: { methodId: this.methodId(design), revisionId: open.id, methodVersion, comment: request.comment ?? null, supersededVersion: previous?.methodVersion ?? null },
        },
        tx,
      );
      return { design, row: row! };
    });
    return this.revisionView(design, row, false);
  }

  async versions(user: AuthUser, slug: string): Promise<MethodVersionList> {
    const design = await this.requireDesign(slug);
    const rows = await this.repository.listRevisions(design.id, visibleStates(user.role));
    if (rows.length === 0) throw MethodDesignsException.of('design-not-found');
    const people = await this.repository.peopleByIds(rows.flatMap(revisionPeopleIds));
    return {
      items: rows.map((row) => {
        const { definition, problems: _problems, tex: _tex, methodId: _methodId, updatedBy: _updatedBy, ...entry } = toMethodRevision(slug, row, people);
        return { ...entry, name: definition.name };
      }),
    };
  }

  async version(slug: string, methodVersion: number | null): Promise<MethodRevision> {
    const design = await this.requireDesign(slug);
    const row = methodVersion === null ? undefined : await this.repository.findReleased(design.id, methodVersion);
    if (!row) throw MethodDesignsException.of('version-not-found');
    return this.revisionView(design, row, false);
  }

  async compare(user: AuthUser, slug: string, query: MethodCompareQuery): Promise<MethodCompare> {
    const design = await this.requireDesign(slug);
    const side = async (which: MethodCompareQuery['from']): Promise<MethodDesignRevisionRow> => {
      if (which === 'draft') {
        const open = await this.repository.findOpen(design.id);
        if (!open) throw MethodDesignsException.of('draft-not-found');
        if (!this.visibleOpen(user, open)) throw MethodDesignsException.of('drafts-hidden');
        return open;
      }
      const released = await this.repository.findReleased(design.id, which);
      if (!released) throw MethodDesignsException.of('version-not-found');
      return released;
    };
    const from = await side(query.from);
    const to = await side(query.to);
    const ref = (row: MethodDesignRevisionRow) => ({ id: row.id, state: row.state, methodVersion: row.methodVersion });
    return { from: ref(from), to: ref(to), changes: compareDefinitions(from.definition, to.definition) };
  }

  /** A new draft holding an earlier version's definition; refused while a version is open. */
  async restore(actor: AuthUser, slug: string, methodVersion: number | null): Promise<MethodRevision> {
    const { design, draft } = await this.repository.transaction(async (tx) => {
      const design = await this.lockDesign(slug, tx);
      const source = methodVersion === null ? undefined : await this.repository.findReleased(design.id, methodVersion, tx);
      if (!source) throw MethodDesignsException.of('version-not-found');
      if (await this.repository.findOpen(design.id, tx)) throw MethodDesignsException.of('restore-open-revision');
      const draft = await this.repository.insertRevision(
        { designId: design.id, state: 'draft', definition: source.definition, createdBy: actor.id, updatedBy: actor.id, restoredFromVersion: methodVersion },
        tx,
      );
      if (!draft) throw MethodDesignsException.of('restore-open-revision');
      await this.audit.record(
        { actor, action: 'method.restored', subjectType: 'method_design', subjectId: design.id, detail: { methodId: this.methodId(design), fromVersion: methodVersion, revisionId: draft.id } },
        tx,
      );
      return { design, draft };
    });
    return this.revisionView(design, draft, true);
  }

  private methodId(design: MethodDesignRow): string {
    return `${houseMethodPrefix}${design.slug}`;
  }

  private designUrl(design: MethodDesignRow, suffix: string): string {
    return `${this.config.publicUrl}/method-designs/${design.slug}${suffix}`;
  }

  /** The open revision if `user` may see it: authors and admins always, reviewers while it is in review. */
  private visibleOpen(user: AuthUser, open: MethodDesignRevisionRow | undefined): MethodDesignRevisionRow | undefined {
    if (!open) return undefined;
    if (seesDrafts(user.role)) return open;
    return open.state === 'in_review' && seesReviews(user.role) ? open : undefined;
  }

  private async requireDesign(slug: string): Promise<MethodDesignRow> {
    return (await this.repository.findDesign(slug)) ?? Promise.reject(MethodDesignsException.of('design-not-found'));
  }

  private async lockDesign(slug: string, tx: Executor): Promise<MethodDesignRow> {
    return (await this.repository.lockDesign(slug, tx)) ?? Promise.reject(MethodDesignsException.of('design-not-found'));
  }

  /** The open revision in state draft; a change aimed at "the draft" of a released-only method is refused. */
  private async requireDraft(design: MethodDesignRow): Promise<MethodDesignRevisionRow> {
    const open = await this.repository.findOpen(design.id);
    if (!open) throw MethodDesignsException.of((await this.repository.findReleased(design.id, null)) ? 'released-immutable' : 'draft-not-found');
    if (open.state !== 'draft') throw MethodDesignsException.of('in-review');
    return open;
  }

  private async lockInReview(slug: string, tx: Executor): Promise<{ design: MethodDesignRow; open: MethodDesignRevisionRow }> {
    const design = await this.lockDesign(slug, tx);
    const open = await this.repository.findOpen(design.id, tx);
    if (!open || open.state !== 'in_review') throw MethodDesignsException.of('not-in-review');
    return { design, open };
  }

  private async check(definition: DesignDefinition): Promise<DesignCheckReport> {
    const outcome = await this.methods.runDesignTask({ kind: 'check', definition }, 'design check');
    if (!outcome.ok) throw MethodDesignsException.invalidDefinition(outcome.message, outcome.fields);
    if (outcome.kind !== 'check') throw new Error('Unexpected design outcome');
    return outcome.check;
  }

  /** Refuses (400) a definition the sandbox refuses; other problems are kept with the draft. */
  private async requireEvaluable(definition: DesignDefinition, prefix: string): Promise<DesignCheckReport> {
    const check = await this.check(definition);
    if (check.refused) throw MethodDesignsException.invalidDefinition('A formula uses something the evaluator does not allow.', prefixed(prefix, check.problems), check.tex);
    return check;
  }

  private async testRun(definition: DesignDefinition): Promise<TestRun> {
    const outcome = await this.methods.runDesignTask({ kind: 'tests', definition }, 'test table');
    if (!outcome.ok) throw MethodDesignsException.invalidDefinition(outcome.message, outcome.fields);
    if (outcome.kind !== 'tests') throw new Error('Unexpected design outcome');
    return outcome.run;
  }

  private async revisionView(design: MethodDesignRow, row: MethodDesignRevisionRow, withCheck: boolean, known?: DesignCheckReport): Promise<MethodRevision> {
    const open = row.state === 'draft' || row.state === 'in_review';
    const check = known ?? (withCheck || open ? await this.check(row.definition) : undefined);
    const people = await this.repository.peopleByIds(revisionPeopleIds(row));
    return toMethodRevision(design.slug, row, people, check ? { problems: open ? check.problems : {}, tex: check.tex } : { problems: {}, tex: expressionTex(designExpressions(row.definition)) });
  }
}
