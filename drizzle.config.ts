import { defineConfig } from 'drizzle-kit';

// drizzle-kit generate writes SQL migrations from db/schema; they are committed and applied at start.
export default defineConfig({
  dialect: 'postgresql',
  schema: './db/schema/index.ts',
  out: './db/migrations',
});
