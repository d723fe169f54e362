import { defineConfig } from 'drizzle-kit';

// Migrations are generated offline from server/db/schema.ts and committed; the server applies them at start.
export default defineConfig({
  dialect: 'postgresql',
  schema: './server/db/schema.ts',
  out: './drizzle',
});
