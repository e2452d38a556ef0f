// What a start-up must refuse or leave out outside the demo. Plain values in, so the rules are
// tested without a server; src/lib/server/auth.ts and src/services/startup.ts apply them.
// NODE_ENV is no guide here: npm start sets it itself.

/** The settings these rules read. */
export interface DeploymentEnv {
  DATABASE_URL?: string;
  BETTER_AUTH_SECRET?: string;
  DEMO_DATA?: 'on' | 'off';
}

/** Shortest session secret accepted for a shared database (better-auth asks for 32). */
const MIN_SECRET = 32;

/** The demo shop only when asked, or by default on the embedded database (the `npm start` demo). */
export function demoWanted(env: DeploymentEnv): boolean {
  if (env.DEMO_DATA) return env.DEMO_DATA === 'on';
  return !env.DATABASE_URL;
}

/** One line saying what to set, when the server must not start; null when it may. */
export function deploymentProblem(env: DeploymentEnv): string | null {
  if (env.DATABASE_URL && (env.BETTER_AUTH_SECRET ?? '').length < MIN_SECRET) {
    return `Cuffwright will not start: with DATABASE_URL set, set BETTER_AUTH_SECRET to the same random value of ${MIN_SECRET}+ characters on every server (e.g. openssl rand -base64 32).`;
  }
  return null;
}

/** Says the problem in one line and exits, before a server with unsafe settings serves anything. */
export function refuseUnsafeStart(env: DeploymentEnv): void {
  const problem = deploymentProblem(env);
  if (!problem) return;
  console.error(problem);
  process.exit(1);
}
