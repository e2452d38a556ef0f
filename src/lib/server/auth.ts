// better-auth for Cuffwright: e-mail + password, sessions in the database, password reset and
// invitations by e-mail, shops as organisations with the four roles.
import { betterAuth } from 'better-auth';
import { drizzleAdapter } from 'better-auth/adapters/drizzle';
import { BETTER_AUTH_SECRET, BETTER_AUTH_URL, DATABASE_URL, DATA_DIR } from 'astro:env/server';
import { dataDir } from '@/db/app-paths';
import { db } from '@/db';
import * as authSchema from '@/db/schema/auth';
import { appAuthHooks } from './auth-hooks';
import { shopPlugin } from './auth-plugins';
import { authSecret } from './auth-secret';
import { refuseUnsafeStart } from './deployment';
import { sendMail } from './mail';
import { translator } from './i18n/catalog';
import { shopLanguage, userLanguage } from './i18n/shop-language';
import { invitationMail } from './invitation-mail';

// A shared database without a session secret stops here (and in services/startup.ts, at start).
refuseUnsafeStart({ DATABASE_URL, BETTER_AUTH_SECRET });

/** The better-auth instance; its HTTP handler answers /api/auth/*. */
export const auth = betterAuth({
  baseURL: BETTER_AUTH_URL,
  secret: authSecret(BETTER_AUTH_SECRET, dataDir(DATA_DIR), DATABASE_URL),
  trustedOrigins: [BETTER_AUTH_URL],
  database: drizzleAdapter(db, { provider: 'pg', schema: authSchema }),
  emailAndPassword: {
    enabled: true,
    minPasswordLength: 10,
    resetPasswordTokenExpiresIn: 3600,
    revokeSessionsOnPasswordReset: true,
    sendResetPassword: async ({ user, url }) => {
      // In the language of the person's shop (the default when none, or shops that differ).
      const t = translator(await userLanguage(user.id));
      await sendMail(
        { to: user.email, subject: t('reset.subject'), text: t('reset.body', { name: user.name, url }) },
        { shopId: null, kind: 'password-reset' },
      );
    },
  },
  session: { expiresIn: 60 * 60 * 24 * 7, updateAge: 60 * 60 * 24 },
  // Failed sign-ins are limited per account in src/services/sign-in-limit.ts; better-auth's own
  // limiter keys on a client IP header that a loopback deployment never sends.
  rateLimit: { enabled: false },
  // better-auth turns its origin and callback-URL checks off by itself when NODE_ENV is "test"
  // (a server started from a test runner that passes its own on): keep them on, as in production.
  advanced: { disableOriginCheck: false },
  plugins: [
    appAuthHooks(),
    shopPlugin({
      sendInvitation: async ({ id, email, role, shopId, shopName, inviterName }) =>
        sendMail(
          { to: email, ...invitationMail(translator(await shopLanguage(shopId)), BETTER_AUTH_URL, { id, role, shopName, inviterName }) },
          { shopId, kind: 'invitation' },
        ),
    }),
  ],
});

/** A signed-in session as better-auth returns it. */
export type AuthSession = NonNullable<Awaited<ReturnType<typeof auth.api.getSession>>>;
