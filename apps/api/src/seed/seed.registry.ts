import { Injectable } from '@nestjs/common';
import { type SeedStep } from './seed-step.js';

/** Modules register their seed steps here (typically in `onModuleInit`); the seeder runs them in order. */
@Injectable()
export class SeedRegistry {
  private readonly steps = new Map<string, SeedStep>();

  register(step: SeedStep): void {
    if (this.steps.has(step.name)) throw new Error(`Seed step "${step.name}" is registered twice`);
    this.steps.set(step.name, step);
  }

  ordered(): SeedStep[] {
    return [...this.steps.values()].sort((a, b) => a.order - b.order || a.name.localeCompare(b.name));
  }
}
