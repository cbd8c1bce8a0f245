import { readFile } from 'node:fs/promises';
import { join } from 'node:path';
import { Injectable, type OnModuleInit } from '@nestjs/common';
import { roleSchema } from '@limitbook/contracts';
import { z } from 'zod';
import { type SeedContext, type SeedStep } from '../../seed/seed-step.js';
import { SeedRegistry } from '../../seed/seed.registry.js';
import { AuditService } from '../audit/audit.service.js';
import { PasswordService } from '../auth/password.service.js';
import { UsersRepository } from './users.repository.js';

const demoPeopleSchema = z.object({
  organisation: z.string(),
  people: z.array(
    z.object({
      email: z.email().transform((value) => value.toLowerCase()),
      name: z.string().min(1),
      role: roleSchema,
      password: z.string().min(8),
    }),
  ),
});
type DemoPeople = z.infer<typeof demoPeopleSchema>;

export function demoPeopleFile(contentDir: string): string {
  return join(contentDir, 'demo', 'people.json');
}

export async function readDemoPeople(contentDir: string): Promise<DemoPeople> {
  const file = demoPeopleFile(contentDir);
  let raw: string;
  try {
    raw = await readFile(file, 'utf8');
  } catch (error) {
    throw new Error(`Demo people not found at ${file} (set LIMITBOOK_CONTENT_DIR): ${String(error)}`, { cause: error });
  }
  return demoPeopleSchema.parse(JSON.parse(raw));
}

/** The admin named by LIMITBOOK_ADMIN_EMAIL/PASSWORD, created on an empty database only. */
@Injectable()
export class BootstrapAdminSeed implements SeedStep, OnModuleInit {
  readonly name = 'bootstrap-admin';
  readonly order = 0;

  constructor(
    private readonly registry: SeedRegistry,
    private readonly users: UsersRepository,
    private readonly passwords: PasswordService,
    private readonly audit: AuditService,
  ) {}

  onModuleInit(): void {
    this.registry.register(this);
  }

  async run({ mode, config, logger }: SeedContext): Promise<void> {
    const admin = config.bootstrapAdmin;
    if (mode !== 'first-start' || !admin) return;
    if (await this.users.findByEmail(admin.email)) return;
    const user = await this.users.insert({
      email: admin.email,
      name: admin.email.split('@')[0] ?? 'Admin',
      role: 'admin',
      status: 'active',
      passwordHash: await this.passwords.hash(admin.password),
    });
    await this.audit.record({ actor: null, action: 'user.bootstrapped', subjectType: 'user', subjectId: user.id, detail: { email: user.email, role: 'admin' } });
    logger.log(`Created the admin ${admin.email} from LIMITBOOK_ADMIN_EMAIL.`);
  }
}

/** One account per role for the demo company, from content/demo/people.json. */
@Injectable()
export class DemoPeopleSeed implements SeedStep, OnModuleInit {
  readonly name = 'demo-people';
  readonly order = 10;

  constructor(
    private readonly registry: SeedRegistry,
    private readonly users: UsersRepository,
    private readonly passwords: PasswordService,
    private readonly audit: AuditService,
  ) {}

  onModuleInit(): void {
    this.registry.register(this);
  }

  async run({ mode, config, logger }: SeedContext): Promise<void> {
    if (mode === 'first-start' && !config.seedDemo) return;
    const demo = await readDemoPeople(config.contentDir);
    for (const person of demo.people) {
      const passwordHash = await this.passwords.hash(person.password);
      const existing = await this.users.findByEmail(person.email);
      if (existing) {
        await this.users.update(existing.id, { name: person.name, role: person.role, status: 'active', passwordHash });
      } else {
        await this.users.insert({ email: person.email, name: person.name, role: person.role, status: 'active', passwordHash });
      }
    }
    await this.audit.record({ actor: null, action: 'demo.people_loaded', subjectType: 'demo', detail: { organisation: demo.organisation, people: demo.people.length } });
    logger.log(`Loaded ${demo.people.length} demo people (${demo.organisation})`);
  }

  /** Lists only demo accounts that still sign in with their published password. */
  async announce({ config, logger }: Omit<SeedContext, 'mode'>): Promise<void> {
    if (!config.seedDemo) return;
    const demo = await readDemoPeople(config.contentDir).catch(() => undefined);
    if (!demo) return;
    const usable: DemoPeople['people'] = [];
    for (const person of demo.people) {
      const user = await this.users.findByEmail(person.email);
      if (user?.status === 'active' && user.passwordHash && (await this.passwords.verify(user.passwordHash, person.password))) usable.push(person);
    }
    if (usable.length === 0) return;
    const width = Math.max(...usable.map((person) => person.email.length));
    logger.warn(
      [
        `Demo accounts of ${demo.organisation}: FOR LOCAL USE ONLY`,
        ...usable.map((person) => `  ${person.role.padEnd(9)} ${person.email.padEnd(width)}  ${person.password}`),
        'Anyone who can reach this server can sign in with these. Set LIMITBOOK_SEED_DEMO=false and change them before sharing it.',
      ].join('\n'),
    );
  }
}
