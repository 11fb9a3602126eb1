import { defineConfig } from 'drizzle-kit';

// Generates SQL migrations from db/schema into db/migrations (committed). Generation needs no database.
export default defineConfig({
  dialect: 'postgresql',
  schema: './db/schema/index.ts',
  out: './db/migrations',
});
