import { Injectable, type OnModuleInit } from '@nestjs/common';
import { type SeedContext, type SeedStep } from '../../../seed/seed-step.js';
import { SeedRegistry } from '../../../seed/seed.registry.js';
import { AuditService } from '../../audit/audit.service.js';
import { readDemoPeople } from '../../users/users.seed.js';
import { CollectionsRepository } from '../collections.repository.js';
import { PagesRepository } from '../pages.repository.js';
import { nextRevisionLetter } from '../revision-letter.js';
import { DemoContentError, type DemoLibrary, readDemoLibrary } from './demo-content.js';

/** Key order of JSON objects is not kept by jsonb, so bodies are compared in a canonical form. */
function canonical(value: unknown): string {
  if (Array.isArray(value)) return `[${value.map(canonical).join(',')}]`;
  if (value && typeof value === 'object') {
    const entries = Object.entries(value as Record<string, unknown>)
      .filter(([, entry]) => entry !== undefined)
      .sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0));
    return `{${entries.map(([key, entry]) => `${JSON.stringify(key)}:${canonical(entry)}`).join(',')}}`;
  }
  return JSON.stringify(value);
}

export interface DemoLoadResult {
  collections: number;
  created: number;
  republished: number;
  unchanged: number;
}

/**
 * The demo library from content/demo: its collections and every standard as a page owned by
 * the person named in its front matter, released as revision A and approved by the demo
 * reviewer. Loaded on an empty database, and again by `--seed`, which matches pages by
 * document number and releases the next revision of each one whose title or body changed
 * (superseding the one before). Drafts are left alone.
 */
@Injectable()
export class DemoLibrarySeed implements SeedStep, OnModuleInit {
  readonly name = 'demo-library';
  readonly order = 50;

  constructor(
    private readonly registry: SeedRegistry,
    private readonly collections: CollectionsRepository,
    private readonly pages: PagesRepository,
    private readonly audit: AuditService,
  ) {}

  onModuleInit(): void {
    this.registry.register(this);
  }

  async run({ mode, config, logger }: SeedContext): Promise<void> {
    if (mode === 'first-start' && !config.seedDemo) return;
    const library = await readDemoLibrary(config.contentDir);
    const people = await readDemoPeople(config.contentDir).catch(() => undefined);
    const result = await this.load(library, people?.people.find((person) => person.role === 'reviewer')?.email);
    logger.log(
      `Demo library: ${result.collections} collections, ${library.standards.length} standards (${result.created} new, ${result.republished} republished, ${result.unchanged} unchanged).`,
    );
  }

  /** `approverEmail`: who approves the releases; the owner when absent or not a user. */
  async load(library: DemoLibrary, approverEmail?: string): Promise<DemoLoadResult> {
    return this.pages.transaction(async (tx) => {
      const approverId = approverEmail ? await this.pages.findUserIdByEmail(approverEmail, tx) : undefined;
      const collectionIds = new Map<string, string>();
      for (const entry of library.collections) {
        const existing = await this.collections.findByKey(entry.key, tx);
        const row = existing
          ? await this.collections.update(existing.id, { name: entry.name, description: entry.description }, tx)
          : await this.collections.insert(entry, tx);
        collectionIds.set(entry.key, row!.id);
      }

      const result: DemoLoadResult = { collections: library.collections.length, created: 0, republished: 0, unchanged: 0 };
      for (const standard of library.standards) {
        const ownerId = await this.pages.findUserIdByEmail(standard.owner, tx);
        if (!ownerId) throw new DemoContentError(`${standard.file}: front matter: owner ${standard.owner} is not a user; add them to content/demo/people.json`);
        const collectionId = collectionIds.get(standard.collection)!;
        const found = await this.pages.findPage({ documentNumber: standard.documentNumber }, tx);
        const page = found
          ? await this.pages.updatePage(found.page.id, { collectionId, ownerId, tags: standard.tags }, tx)
          : await this.pages.insertPage({ documentNumber: standard.documentNumber, collectionId, ownerId, tags: standard.tags, createdBy: ownerId }, tx);
        const current = page!.currentPublishedRevisionId ? await this.pages.findRevision(page!.currentPublishedRevisionId, tx) : undefined;
        if (current && current.title === standard.title && canonical(current.document) === canonical(standard.content.document)) {
          result.unchanged += 1;
          continue;
        }
        const revision = await this.pages.insertRevision(
          {
            pageId: page!.id,
            documentNumber: standard.documentNumber,
            state: 'released',
            title: standard.title,
            content: standard.content,
            userId: ownerId,
            revisionLetter: nextRevisionLetter(current?.revisionLetter),
          },
          tx,
        );
        const approved = await this.pages.transition(revision!.id, 'released', { publishedBy: approverId ?? ownerId }, tx);
        if (current) await this.pages.transition(current.id, 'released', { state: 'superseded', supersededAt: approved!.publishedAt }, tx);
        await this.pages.updatePage(page!.id, { currentPublishedRevisionId: revision!.id }, tx);
        if (found) result.republished += 1;
        else result.created += 1;
      }
      await this.audit.record({ actor: null, action: 'demo.library_loaded', subjectType: 'demo', detail: { ...result } }, tx);
      return result;
    });
  }
}
