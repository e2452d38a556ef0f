// The four roles as the issue describes them, checked on the one shared definition.
import { describe, expect, it } from 'vitest';
import { can, grants, ROLES, statements, type Permission } from '@/lib/shared/roles';

const everything: Permission[] = Object.entries(statements).flatMap(([r, actions]) => (actions as readonly string[]).map((a) => [r, a] as Permission));
const shopPermissions = everything.filter(([r]) => !['organization', 'member', 'invitation', 'team', 'ac'].includes(r));

describe('roles', () => {
  it('lead may do everything in the shop', () => {
    for (const p of shopPermissions) expect(can('lead', p), p.join(':')).toBe(true);
  });

  it('only the lead manages staff, house presets, prices and settings', () => {
    const leadOnly: Permission[] = [
      ['staff', 'read'],
      ['staff', 'invite'],
      ['staff', 'change-role'],
      ['staff', 'remove'],
      ['presets', 'manage-house'],
      ['prices', 'update'],
      ['settings', 'update'],
      ['messages', 'read'],
      ['tickets', 'reopen'],
      ['overview', 'read'],
      ['invitation', 'create'],
      ['member', 'update'],
      ['member', 'delete'],
    ];
    for (const p of leadOnly) for (const role of ROLES) expect(can(role, p), `${role} ${p.join(':')}`).toBe(role === 'lead');
  });

  it('tailor: customers, tickets, measurements, plans, own presets, cut sheets', () => {
    for (const p of [
      ['customers', 'create'],
      ['tickets', 'update'],
      ['measurements', 'update'],
      ['plans', 'create'],
      ['presets', 'create-own'],
      ['cutsheets', 'print'],
    ] as Permission[]) {
      expect(can('tailor', p), p.join(':')).toBe(true);
    }
  });

  it('apprentice reads the queue, prints cut sheets, moves jobs along, and changes nothing else', () => {
    expect(can('apprentice', ['tickets', 'read'])).toBe(true);
    expect(can('apprentice', ['tickets', 'advance'])).toBe(true);
    expect(can('apprentice', ['cutsheets', 'print'])).toBe(true);
    for (const p of [
      ['tickets', 'read-all'],
      ['measurements', 'update'],
      ['presets', 'create-own'],
      ['presets', 'manage-house'],
      ['prices', 'update'],
      ['customers', 'read'],
      ['tickets', 'create'],
      ['tickets', 'pickup'],
    ] as Permission[]) {
      expect(can('apprentice', p), p.join(':')).toBe(false);
    }
  });

  it('counter: customers, intake, pickup, notices, and reads plans without changing them', () => {
    for (const p of [
      ['customers', 'create'],
      ['tickets', 'create'],
      ['tickets', 'pickup'],
      ['notices', 'send'],
      ['plans', 'read'],
    ] as Permission[]) {
      expect(can('counter', p), p.join(':')).toBe(true);
    }
    for (const p of [
      ['plans', 'create'],
      ['measurements', 'update'],
      ['tickets', 'advance'],
    ] as Permission[])
      expect(can('counter', p), p.join(':')).toBe(false);
  });

  it('grants only what the statements define, and nothing to no role', () => {
    for (const role of ROLES) {
      for (const [resource, actions] of Object.entries(grants[role])) {
        for (const a of actions as readonly string[]) expect((statements as Record<string, readonly string[]>)[resource]).toContain(a);
      }
    }
    expect(can(null, ['tickets', 'read'])).toBe(false);
  });
});
