import { Injectable, type OnModuleInit } from '@nestjs/common';
import { type SeedContext, type SeedStep } from '../../../seed/seed-step.js';
import { SeedRegistry } from '../../../seed/seed.registry.js';
import { AuditService } from '../../audit/audit.service.js';
import { DemoContentError } from '../../library/demo/demo-content.js';
import { readDemoPeople } from '../../users/users.seed.js';
import { MethodDesignsRepository } from '../method-designs.repository.js';
import { type DemoMethod, readDemoMethods } from './demo-methods.js';

/** Key order of JSON objects is not kept by jsonb, so definitions are compared in a canonical form. */
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

export interface DemoMethodsResult {
  created: number;
  released: number;
  unchanged: number;
}

/**
 * The demo's in-house methods from content/demo/methods, released as version 1 by their author
 * and approved by the demo reviewer. Runs before the demo library, whose pages pin them. `--seed`
 * releases the next version of a method whose definition changed (superseding the one before);
 * drafts are left alone.
 */
@Injectable()
export class DemoMethodsSeed implements SeedStep, OnModuleInit {
  readonly name = 'demo-methods';
  readonly order = 40;

  constructor(
    private readonly registry: SeedRegistry,
    private readonly repository: MethodDesignsRepository,
    private readonly audit: AuditService,
  ) {}

  onModuleInit(): void {
    this.registry.register(this);
  }

  async run({ mode, config, logger }: SeedContext): Promise<void> {
    if (mode === 'first-start' && !config.seedDemo) return;
    const methods = await readDemoMethods(config.contentDir);
    const people = await readDemoPeople(config.contentDir).catch(() => undefined);
    const result = await this.load(methods, people?.people.find((person) => person.role === 'reviewer')?.email);
    logger.log(`Demo in-house methods: ${methods.length} (${result.created} new, ${result.released} new versions, ${result.unchanged} unchanged).`);
  }

  /** `approverEmail`: who approves the releases; the author when absent or not a user. */
  async load(methods: DemoMethod[], approverEmail?: string): Promise<DemoMethodsResult> {
    return this.repository.transaction(async (tx) => {
      const approverId = approverEmail ? await this.repository.findUserIdByEmail(approverEmail, tx) : undefined;
      const result: DemoMethodsResult = { created: 0, released: 0, unchanged: 0 };
      for (const method of methods) {
        const ownerId = await this.repository.findUserIdByEmail(method.owner, tx);
        if (!ownerId) throw new DemoContentError(`${method.file}: owner ${method.owner} is not a user; add them to content/demo/people.json`);
        const existing = await this.repository.findDesign(method.slug, tx);
        const design = existing ?? (await this.repository.insertDesign({ slug: method.slug, ownerId, createdBy: ownerId }, tx))!;
        const current = existing ? await this.repository.findReleased(design.id, null, tx) : undefined;
        if (current && canonical(current.definition) === canonical(method.definition)) {
          result.unchanged += 1;
          continue;
        }
        const methodVersion = (await this.repository.maxMethodVersion(design.id, tx)) + 1;
        const now = new Date();
        if (current) await this.repository.transition(current.id, 'released', { state: 'superseded', supersededAt: now }, tx);
        await this.repository.insertRevision(
          {
            designId: design.id,
            state: 'released',
            methodVersion,
            definition: method.definition,
            createdBy: ownerId,
            updatedBy: ownerId,
            submittedBy: ownerId,
            submittedAt: now,
            releasedBy: approverId ?? ownerId,
            releasedAt: now,
          },
          tx,
        );
        await this.repository.touchDesign(design.id, tx);
        if (existing) result.released += 1;
        else result.created += 1;
      }
      await this.audit.record({ actor: null, action: 'demo.methods_loaded', subjectType: 'demo', detail: { ...result } }, tx);
      return result;
    });
  }
}
