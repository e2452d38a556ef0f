// better-auth's organization plugin enforces the same grants as the app's own guard: both are
// built from src/lib/shared/roles.ts, and this checks that they agree on every action for every role.
import { describe, expect, it } from 'vitest';
import { shopRoles } from '@/lib/server/auth-plugins';
import { can, ROLES, statements, type Permission } from '@/lib/shared/roles';

describe('better-auth roles', () => {
  it('authorize exactly what can() allows, for every role and every action', () => {
    let checked = 0;
    for (const role of ROLES) {
      for (const [resource, actions] of Object.entries(statements)) {
        for (const action of actions as readonly string[]) {
          const theirs = shopRoles[role].authorize({ [resource]: [action] } as never).success;
          expect(theirs, `${role} ${resource}:${action}`).toBe(can(role, [resource, action] as Permission));
          checked += 1;
        }
      }
    }
    expect(checked).toBeGreaterThan(100);
  });
});
