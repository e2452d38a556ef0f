// The signing secret for sessions: BETTER_AUTH_SECRET when set, otherwise one made once and kept
// in DATA_DIR so sessions survive restarts on a single machine.
import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { randomBytes } from 'node:crypto';
import { join } from 'node:path';

/** The secret from the environment, or the one stored in dataDir (created on first use). */
export function authSecret(fromEnv: string | undefined, dataDir: string): string {
  if (fromEnv) return fromEnv;
  const file = join(dataDir, 'auth-secret');
  if (existsSync(file)) return readFileSync(file, 'utf8').trim();
  mkdirSync(dataDir, { recursive: true });
  const secret = randomBytes(32).toString('base64url');
  writeFileSync(file, secret, { mode: 0o600 });
  return secret;
}
