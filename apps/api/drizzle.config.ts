import { defineConfig } from 'drizzle-kit';

// Run from the repository root (`npm run db:generate`); paths are relative to it.
export default defineConfig({
  dialect: 'postgresql',
  schema: './apps/api/src/database/schema/*.ts',
  out: './drizzle',
});
