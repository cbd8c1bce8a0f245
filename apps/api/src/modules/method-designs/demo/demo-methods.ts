import { readdir, readFile } from 'node:fs/promises';
import { join } from 'node:path';
import { designDefinitionSchema, fieldMessages, methodDesignSlugSchema, type DesignDefinition } from '@limitbook/contracts';
import { failingRowMessages, runDesignTests } from '@limitbook/engine';
import { z } from 'zod';
import { DemoContentError } from '../../library/demo/demo-content.js';

export interface DemoMethod {
  file: string;
  slug: string;
  /** E-mail of the author, a person of content/demo/people.json. */
  owner: string;
  definition: DesignDefinition;
}

const demoMethodSchema = z.strictObject({
  slug: methodDesignSlugSchema,
  owner: z.email({ message: 'owner must be the e-mail of a demo person' }),
  definition: designDefinitionSchema,
});

export function demoMethodsDir(contentDir: string): string {
  return join(contentDir, 'demo', 'methods');
}

/**
 * The in-house methods of the demo (content/demo/methods/*.json). Each must be a valid design
 * whose test table passes: a demo method that fails its own worked examples is not loaded.
 */
export async function readDemoMethods(contentDir: string): Promise<DemoMethod[]> {
  const dir = demoMethodsDir(contentDir);
  let files: string[];
  try {
    files = (await readdir(dir)).filter((name) => name.endsWith('.json')).sort();
  } catch {
    return [];
  }
  const methods: DemoMethod[] = [];
  for (const name of files) {
    const file = join(dir, name);
    let raw: unknown;
    try {
      raw = JSON.parse(await readFile(file, 'utf8'));
    } catch (error) {
      throw new DemoContentError(`${file}: not valid JSON (${error instanceof Error ? error.message : String(error)})`);
    }
    const parsed = demoMethodSchema.safeParse(raw);
    if (!parsed.success) {
      const [path, message] = Object.entries(fieldMessages(parsed.error))[0]!;
      throw new DemoContentError(`${file}: ${path}: ${message}`);
    }
    let run;
    try {
      run = runDesignTests(parsed.data.definition);
    } catch (error) {
      const fields = (error as { fields?: Record<string, string> }).fields ?? {};
      const [path, message] = Object.entries(fields)[0] ?? ['definition', error instanceof Error ? error.message : String(error)];
      throw new DemoContentError(`${file}: definition.${path}: ${message}`);
    }
    if (!run.pass) {
      const [path, message] = Object.entries(failingRowMessages(run))[0] ?? ['tests', 'Add at least one test row'];
      throw new DemoContentError(`${file}: definition.${path}: ${message}`);
    }
    methods.push({ file, ...parsed.data, owner: parsed.data.owner.toLowerCase() });
  }
  return methods;
}
