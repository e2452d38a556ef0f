// Safe defaults outside the demo: the demo shop (whose password the README publishes) only on the
// embedded database unless asked for, and no shared database without a session secret.
import { mkdtempSync, existsSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { deploymentProblem, demoWanted } from '@/lib/server/deployment';
import { authSecret } from '@/lib/server/auth-secret';

const PG = 'postgres://shop@db.internal:5432/cuffwright';

describe('demoWanted', () => {
  it('is on for the embedded database by default', () => {
    expect(demoWanted({})).toBe(true);
  });
  it('is off with DATABASE_URL by default', () => {
    expect(demoWanted({ DATABASE_URL: PG })).toBe(false);
  });
  it('follows DEMO_DATA when it is set, on either database', () => {
    expect(demoWanted({ DEMO_DATA: 'off' })).toBe(false);
    expect(demoWanted({ DATABASE_URL: PG, DEMO_DATA: 'on' })).toBe(true);
    expect(demoWanted({ DATABASE_URL: PG, DEMO_DATA: 'off' })).toBe(false);
    expect(demoWanted({ DEMO_DATA: 'on' })).toBe(true);
  });
});

describe('deploymentProblem', () => {
  it('refuses DATABASE_URL without BETTER_AUTH_SECRET, in one line naming what to set', () => {
    const problem = deploymentProblem({ DATABASE_URL: PG });
    expect(problem).toMatch(/BETTER_AUTH_SECRET/);
    expect(problem).not.toContain('\n');
  });
  it('accepts DATABASE_URL with a secret, and the embedded database without one', () => {
    expect(deploymentProblem({ DATABASE_URL: PG, BETTER_AUTH_SECRET: 'x'.repeat(32) })).toBeNull();
    expect(deploymentProblem({})).toBeNull();
  });
  it('refuses a secret too short to sign sessions safely', () => {
    expect(deploymentProblem({ DATABASE_URL: PG, BETTER_AUTH_SECRET: 'short' })).toMatch(/BETTER_AUTH_SECRET/);
  });
});

describe('authSecret', () => {
  it('never makes a per-machine secret file for a shared database', () => {
    const dir = mkdtempSync(join(tmpdir(), 'cw-secret-'));
    expect(() => authSecret(undefined, dir, PG)).toThrow(/BETTER_AUTH_SECRET/);
    expect(existsSync(join(dir, 'auth-secret'))).toBe(false);
  });
  it('keeps one in DATA_DIR for the embedded database', () => {
    const dir = mkdtempSync(join(tmpdir(), 'cw-secret-'));
    const first = authSecret(undefined, dir);
    expect(first.length).toBeGreaterThanOrEqual(32);
    expect(authSecret(undefined, dir)).toBe(first);
    expect(authSecret('from-the-environment-0123456789abcdef', dir, PG)).toBe('from-the-environment-0123456789abcdef');
  });
});
