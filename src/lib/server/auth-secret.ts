// The signing secret for sessions: BETTER_AUTH_SECRET when set, otherwise (embedded database only)
// one made once and kept in DATA_DIR so sessions survive restarts on a single machine.
import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { randomBytes } from 'node:crypto';
import { join } from 'node:path';
import { deploymentProblem } from './deployment';

/** The secret from the environment, or the one stored in dataDir (created on first use). A shared
 * database (databaseUrl) must have it from the environment: a file is one machine's. */
export function authSecret(fromEnv: string | undefined, dataDir: string, databaseUrl?: string): string {
  const problem = deploymentProblem({ DATABASE_URL: databaseUrl, BETTER_AUTH_SECRET: fromEnv });
  if (problem) throw new Error(problem);
  if (fromEnv) return fromEnv;
  const file = join(dataDir, 'auth-secret');
  if (existsSync(file)) return readFileSync(file, 'utf8').trim();
  mkdirSync(dataDir, { recursive: true });
  const secret = randomBytes(32).toString('base64url');
  writeFileSync(file, secret, { mode: 0o600 });
  return secret;
}
