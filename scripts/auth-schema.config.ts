// Only for `npm run auth:schema`: the better-auth CLI loads this to write src/db/schema/auth.ts.
import { betterAuth } from 'better-auth';
import { drizzleAdapter } from 'better-auth/adapters/drizzle';
import { shopPlugin } from '../src/lib/server/auth-plugins';

export const auth = betterAuth({
  database: drizzleAdapter({}, { provider: 'pg' }),
  emailAndPassword: { enabled: true },
  plugins: [shopPlugin({ sendInvitation: async () => {} })],
});
