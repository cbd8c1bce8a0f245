import { Inject, Injectable, Logger } from '@nestjs/common';
import {
  type CalculationRecord,
  type CreateRecordRequest,
  type EvaluationResult,
  type ImpactBlockChange,
  type ImpactEntry,
  type ImpactReport,
  type RecordFilter,
  type RecordImpactList,
  type ReleaseImpact,
  type RecordList,
  type RecordListQuery,
  type Role,
  createRecordRequestSchema,
} from '@limitbook/contracts';
import { type CalculatorBlockAttrs, listCalculatorBlocks } from '@limitbook/editor-schema';
import { type z } from 'zod';
import { type AuthUser } from '../../common/auth/auth-user.js';
import { AppException } from '../../common/errors/app.exception.js';
import { toCsv } from '../../common/csv/csv.js';
import { APP_CONFIG, type ResolvedConfig } from '../../config/config.module.js';
import { type CalculationRecordRow } from '../../database/schema/index.js';
import { AuditService } from '../audit/audit.service.js';
import { MailService } from '../mail/mail.service.js';
import { MethodsService } from '../methods/methods.service.js';
import { toCalculationRecord, toImpactReport } from './dto/record.dto.js';
import { impactMail } from './impact.mail.js';
import { sameJson, setAtPath, valueAtPath } from './input-paths.js';
import { renderRecordPdf } from './record-pdf.js';
import { RecordsException } from './records.exception.js';
import { type RecordView, RecordsRepository, type RevisionOfPage } from './records.repository.js';

/** Revisions a reader can open, hence record under. 'released' is the name document control gives them. */
const recordableStates: readonly string[] = ['released'];
const draftReaders: readonly Role[] = ['admin', 'author'];

/** Records re-run per chunk; the event loop gets a turn between chunks so other requests keep flowing. */
const impactChunkSize = 100;
const exportLimit = 50_000;

type CreateRecord = z.output<typeof createRecordRequestSchema>;

@Injectable()
export class RecordsService {
  private readonly logger = new Logger('Records');

  constructor(
    private readonly repository: RecordsRepository,
    private readonly methods: MethodsService,
    private readonly audit: AuditService,
    private readonly mail: MailService,
    @Inject(APP_CONFIG) private readonly config: ResolvedConfig,
  ) {}

  async create(actor: AuthUser, request: CreateRecordRequest): Promise<CalculationRecord> {
    const body = request as CreateRecord;
    const revision = await this.repository.findRevision(body.pageId, body.revisionId);
    if (!revision) throw RecordsException.of('revision-not-found');
    if (!recordableStates.includes(revision.state)) {
      // Someone who cannot see drafts learns nothing about them.
      throw RecordsException.of(draftReaders.includes(actor.role) ? 'revision-not-released' : 'revision-not-found');
    }
    const block = blocksOf(revision).get(body.blockId);
    if (!block) throw RecordsException.of('block-not-found');

    const unit = body.unit ?? block.unit;
    if (unit !== block.unit && block.locked.length > 0) throw RecordsException.lockedUnitChanged(block.unit);
    const tampered = block.locked.filter((path) => {
      const sent = valueAtPath(body.inputs, path);
      return sent !== undefined && !sameJson(sent, valueAtPath(block.defaults, path));
    });
    if (tampered.length > 0) throw RecordsException.lockedInputChanged(tampered);
    const inputs = withLockedDefaults(body.inputs, block);

    const result = await this.evaluateForRequest(block, inputs, unit);
    const saved = await this.repository.transaction(async (tx) => {
      const row = await this.repository.insert(
        {
          pageId: body.pageId,
          revisionId: body.revisionId,
          blockId: block.blockId,
          methodId: result.method,
          methodVersion: result.version,
          unit: result.unit,
          inputs,
          outputs: result.outputs,
          verdict: result.verdict ?? null,
          steps: result.steps,
          warnings: result.warnings,
          acceptance: block.acceptance,
          reference: body.reference,
          createdBy: actor.id,
        },
        tx,
      );
      await this.audit.record(
        {
          actor,
          action: 'record.created',
          subjectType: 'calculation_record',
          subjectId: row.id,
          detail: { pageId: row.pageId, revisionId: row.revisionId, blockId: row.blockId, method: row.methodId, pass: row.verdict?.pass ?? null },
        },
        tx,
      );
      return row;
    });
    return this.get(saved.id);
  }

  /** Any signed-in user may open a permalink: records are cited on drawings and shared by link. */
  async get(id: string): Promise<CalculationRecord> {
    const view = await this.repository.find(id);
    if (!view) throw RecordsException.of('record-not-found');
    return toCalculationRecord(view);
  }

  async list(user: AuthUser, query: RecordListQuery): Promise<RecordList> {
    const { limit, offset, ...filter } = query;
    const { rows, total } = await this.repository.list(this.scoped(user, filter), limit, offset);
    return { items: rows.map(toCalculationRecord), total };
  }

  async exportCsv(user: AuthUser, filter: RecordFilter): Promise<string> {
    const { rows } = await this.repository.list(this.scoped(user, filter), exportLimit, 0);
    const header = [
      'record_id',
      'created_at',
      'created_by',
      'document_number',
      'page_title',
      'revision',
      'block_id',
      'method',
      'method_version',
      'unit',
      'pass',
      'verdict',
      'part_number',
      'drawing',
      'note',
      'inputs',
      'outputs',
      'warnings',
    ];
    return toCsv([
      header,
      ...rows.map(({ record, ...view }) => [
        record.id,
        record.createdAt.toISOString(),
        view.creator?.email,
        view.documentNumber,
        view.revisionTitle,
        view.revisionLetter ?? view.revisionSequence,
        record.blockId,
        record.methodId,
        record.methodVersion,
        record.unit,
        record.verdict ? record.verdict.pass : null,
        record.verdict?.summary,
        record.reference.partNumber,
        record.reference.drawing,
        record.reference.note,
        JSON.stringify(record.inputs),
        JSON.stringify(record.outputs),
        record.warnings.join('; '),
      ]),
    ]);
  }

  async pdf(id: string): Promise<{ file: Buffer; filename: string }> {
    const record = await this.get(id);
    return { file: await renderRecordPdf(record), filename: `limitbook-record-${record.id}.pdf` };
  }

  private scoped(user: AuthUser, filter: RecordFilter) {
    const { scope, ...rest } = filter;
    if (scope === 'all' && user.role !== 'admin') throw RecordsException.of('all-records-admin-only');
    return scope === 'all' ? rest : { ...rest, ownerId: user.id };
  }

  /** Method errors on a reader's inputs come back keyed under `inputs.` like the request's own fields. */
  private async evaluateForRequest(block: CalculatorBlockAttrs, inputs: Record<string, unknown>, unit: CalculatorBlockAttrs['unit']): Promise<EvaluationResult> {
    try {
      return await this.methods.evaluate({ method: block.method, methodVersion: block.methodVersion, inputs, unit, acceptance: block.acceptance ?? undefined });
    } catch (error) {
      if (error instanceof AppException && error.getStatus() === 400 && error.fields) {
        const fields = Object.fromEntries(
          Object.entries(error.fields).map(([key, message]) => [key === 'inputs' || key.startsWith('inputs.') || key === 'method' || key === 'methodVersion' || key.startsWith('acceptance.') ? key : `inputs.${key}`, message]),
        );
        throw new AppException(400, 'VALIDATION_FAILED', error.message, fields);
      }
      throw error;
    }
  }

  /**
   * Re-runs the records made under `fromRevisionId` on every block whose settings changed in
   * `toRevisionId` (method, version, unit, locked inputs, acceptance rule), with the new
   * settings and each record's own unlocked inputs; stores a report of the records whose
   * verdict or key outputs change and mails each affected owner once. Call it when a revision
   * is released, with the previous release as `fromRevisionId`.
   */
  async checkImpact(pageId: string, fromRevisionId: string, toRevisionId: string, actor: AuthUser | null = null): Promise<ImpactReport> {
    const [from, to] = await Promise.all([this.repository.findRevision(pageId, fromRevisionId), this.repository.findRevision(pageId, toRevisionId)]);
    if (!from || !to) {
      if (!(await this.repository.pageExists(pageId))) throw RecordsException.of('page-not-found');
      const fields: Record<string, string> = {};
      if (!from) fields['fromRevisionId'] = 'No such revision on this page';
      if (!to) fields['toRevisionId'] = 'No such revision on this page';
      throw new AppException(404, 'NOT_FOUND', 'The page has no revision with this id.', fields);
    }
    const oldBlocks = blocksOf(from);
    const newBlocks = blocksOf(to);
    const changedBlocks: ImpactBlockChange[] = [];
    for (const [blockId, before] of oldBlocks) {
      const after = newBlocks.get(blockId);
      if (!after) continue;
      const changes = blockChanges(before, after);
      if (changes.length > 0) changedBlocks.push({ blockId, caption: after.caption, changes });
    }

    const affected: ImpactEntry[] = [];
    const affectedViews: RecordView[] = [];
    let recordsChecked = 0;
    let afterId: string | null = null;
    const blockIds = changedBlocks.map((change) => change.blockId);
    for (;;) {
      const chunk = await this.repository.recordsOnBlocks(from.id, blockIds, afterId, impactChunkSize);
      if (chunk.length === 0) break;
      const entries = await Promise.all(chunk.map((view) => this.reRun(view, oldBlocks.get(view.record.blockId)!, newBlocks.get(view.record.blockId)!)));
      entries.forEach((entry, index) => {
        if (entry) {
          affected.push(entry);
          affectedViews.push(chunk[index]!);
        }
      });
      recordsChecked += chunk.length;
      afterId = chunk[chunk.length - 1]!.record.id;
      await new Promise<void>((resolve) => setImmediate(resolve));
    }

    const row = await this.repository.insertImpactReport({ pageId, fromRevisionId, toRevisionId, changedBlocks, recordsChecked, affected, createdBy: actor?.id ?? null });
    await this.audit.record({
      actor,
      action: 'records.impact_checked',
      subjectType: 'impact_report',
      subjectId: row.id,
      detail: { pageId, fromRevisionId, toRevisionId, recordsChecked, affected: affected.length },
    });
    this.mailOwners(to, affectedViews);
    return toImpactReport(row, actor ? { id: actor.id, name: actor.name, email: actor.email } : null);
  }

  /** The impact check of a release: stored, still running after approval, or not needed (first release). */
  async releaseImpact(pageId: string, revisionId: string): Promise<ReleaseImpact> {
    const revision = await this.repository.findRevision(pageId, revisionId);
    if (!revision || !['released', 'superseded'].includes(revision.state)) throw RecordsException.of('revision-not-found');
    const previous = await this.repository.releaseBefore(pageId, revision.sequence);
    if (!previous) return { status: 'none', report: null };
    const found = await this.repository.latestImpactReport(previous, revisionId);
    return found ? { status: 'ready', report: toImpactReport(found.report, found.creator) } : { status: 'pending', report: null };
  }

  /** Later releases under which this record comes out differently; the latest check per release. */
  async recordImpact(id: string): Promise<RecordImpactList> {
    const view = await this.repository.find(id);
    if (!view) throw RecordsException.of('record-not-found');
    const seen = new Set<string>();
    const items: RecordImpactList['items'] = [];
    for (const { report, toRevisionLetter } of await this.repository.impactReportsListing(id, view.record.revisionId)) {
      if (seen.has(report.toRevisionId)) continue;
      seen.add(report.toRevisionId);
      const entry = report.affected.find((affected) => affected.recordId === id);
      if (!entry) continue;
      items.push({
        reportId: report.id,
        toRevision: { id: report.toRevisionId, revisionLetter: toRevisionLetter },
        checkedAt: report.createdAt.toISOString(),
        before: entry.before,
        after: entry.after,
      });
    }
    return { items };
  }

  async getImpactReport(id: string): Promise<ImpactReport> {
    const found = await this.repository.findImpactReport(id);
    if (!found) throw RecordsException.of('report-not-found');
    return toImpactReport(found.report, found.creator);
  }

  /** One record under the new block; an entry only when its verdict or key outputs change. */
  private async reRun(view: RecordView, oldBlock: CalculatorBlockAttrs, newBlock: CalculatorBlockAttrs): Promise<ImpactEntry | null> {
    const { record } = view;
    const keys = keyOutputNames(record, oldBlock, newBlock);
    const before = { pass: record.verdict?.pass ?? null, keyOutputs: pick(record.outputs, keys) };
    let after: ImpactEntry['after'];
    try {
      const result = await this.methods.evaluate({
        method: newBlock.method,
        methodVersion: newBlock.methodVersion,
        inputs: withLockedDefaults(record.inputs, newBlock),
        unit: record.unit,
        acceptance: newBlock.acceptance ?? undefined,
      });
      after = { pass: result.verdict?.pass ?? null, keyOutputs: pick(result.outputs, keys) };
    } catch (error) {
      if (!(error instanceof AppException)) throw error;
      after = { pass: null, keyOutputs: {}, error: error.message };
    }
    if (before.pass === after.pass && sameJson(before.keyOutputs, after.keyOutputs) && !after.error) return null;
    return { recordId: record.id, blockId: record.blockId, owner: view.creator, before, after };
  }

  private mailOwners(revision: RevisionOfPage, views: RecordView[]): void {
    const byOwner = new Map<string, RecordView[]>();
    for (const view of views) {
      if (!view.creator) continue;
      byOwner.set(view.creator.id, [...(byOwner.get(view.creator.id) ?? []), view]);
    }
    for (const owned of byOwner.values()) {
      const owner = owned[0]!.creator!;
      const documentNumber = owned[0]!.documentNumber;
      const mail = impactMail({
        name: owner.name,
        documentNumber,
        title: revision.title,
        records: owned.map(({ record }) => ({
          url: `${this.config.publicUrl}/records/${record.id}`,
          label: [record.reference.partNumber, record.reference.drawing].filter(Boolean).join(' / ') || `Record of ${record.createdAt.toISOString().slice(0, 10)}`,
        })),
        listUrl: `${this.config.publicUrl}/records`,
      });
      this.mail.dispatch({ to: owner.email, ...mail });
    }
    if (byOwner.size > 0) this.logger.log(`Impact check on ${revision.id}: mailed ${byOwner.size} record owner(s)`);
  }
}

function blocksOf(revision: RevisionOfPage): Map<string, CalculatorBlockAttrs> {
  try {
    return new Map(listCalculatorBlocks(revision.document).map((block) => [block.blockId, block]));
  } catch {
    // Documents are validated on save; one that no longer parses has no usable blocks.
    return new Map();
  }
}

function withLockedDefaults(inputs: Record<string, unknown>, block: CalculatorBlockAttrs): Record<string, unknown> {
  const merged = structuredClone(inputs);
  for (const path of block.locked) setAtPath(merged, path, valueAtPath(block.defaults, path));
  return merged;
}

function lockedValues(block: CalculatorBlockAttrs): Record<string, unknown> {
  return Object.fromEntries(block.locked.map((path) => [path, valueAtPath(block.defaults, path)]));
}

function blockChanges(before: CalculatorBlockAttrs, after: CalculatorBlockAttrs): ImpactBlockChange['changes'] {
  const changes: ImpactBlockChange['changes'] = [];
  if (before.method !== after.method) changes.push('method');
  if (before.methodVersion !== after.methodVersion) changes.push('methodVersion');
  if (before.unit !== after.unit) changes.push('unit');
  if (!sameJson(lockedValues(before), lockedValues(after))) changes.push('lockedInputs');
  if (!sameJson(before.acceptance, after.acceptance)) changes.push('acceptance');
  return changes;
}

/** The outputs the acceptance rules judge; without a rule, every plain number the method returned. */
function keyOutputNames(record: CalculationRecordRow, oldBlock: CalculatorBlockAttrs, newBlock: CalculatorBlockAttrs): string[] {
  const ruled = [...new Set([oldBlock.acceptance?.output, newBlock.acceptance?.output].filter((name): name is string => Boolean(name)))];
  if (ruled.length > 0) return ruled;
  return Object.entries(record.outputs)
    .filter(([, value]) => typeof value === 'number')
    .map(([name]) => name);
}

function pick(outputs: Record<string, unknown>, paths: string[]): Record<string, unknown> {
  return Object.fromEntries(paths.map((path) => [path, valueAtPath(outputs, path) ?? null]));
}
