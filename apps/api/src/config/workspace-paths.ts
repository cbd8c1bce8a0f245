import { existsSync } from 'node:fs';
import { dirname, join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';

/**
 * The bundle (apps/api/dist/main.js) and the sources under test sit at different depths,
 * so the workspace root is found by walking up to the folder holding nx.json.
 */
export function workspaceRoot(): string {
  let dir = dirname(fileURLToPath(import.meta.url));
  for (;;) {
    if (existsSync(join(dir, 'nx.json')) && existsSync(join(dir, 'drizzle'))) return dir;
    const parent = dirname(dir);
    if (parent === dir) return process.cwd();
    dir = parent;
  }
}

export const defaultMigrationsDir = (): string => resolve(workspaceRoot(), 'drizzle');
export const defaultWebDist = (): string => resolve(workspaceRoot(), 'apps/web/dist');
