import { defineConfig } from 'drizzle-kit';

// Migrations are generated here and applied by the app at start-up (src/db/migrate.ts).
export default defineConfig({ dialect: 'postgresql', schema: './src/db/schema', out: './drizzle' });
