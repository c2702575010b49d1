import { describe, expect, it } from 'vitest';
import { can, permissions, permissionsByRole, roles } from './roles';

describe('can()', () => {
  it('lets a member read and change their own profile and read the machines', () => {
    expect(can('member', 'read:profile:own')).toBe(true);
    expect(can('member', 'update:profile:own')).toBe(true);
    expect(can('member', 'read:machine:any')).toBe(true);
  });

  it('keeps a member out of the member list, invitations and the outbox', () => {
    expect(can('member', 'read:member:any')).toBe(false);
    expect(can('member', 'update:member:any')).toBe(false);
    expect(can('member', 'create:invitation:any')).toBe(false);
    expect(can('member', 'read:invitation:any')).toBe(false);
    expect(can('member', 'read:outbox:any')).toBe(false);
  });

  it('gives an instructor everything a member has, plus signing off, and no admin work', () => {
    for (const permission of permissions) {
      if (can('member', permission)) expect(can('instructor', permission), permission).toBe(true);
    }
    for (const permission of ['search:member:any', 'create:sign-off:any', 'revoke:sign-off:any', 'read:sign-off:any'] as const) {
      expect(can('instructor', permission), permission).toBe(true);
      expect(can('member', permission), permission).toBe(false);
    }
    for (const permission of ['read:member:any', 'update:member:any', 'manage:training:any', 'manage:shop:any', 'read:audit:any'] as const) {
      expect(can('instructor', permission), permission).toBe(false);
    }
  });

  it('lets everyone tag a machine out, an instructor clear their own tag-outs and only an admin clear any', () => {
    for (const role of roles) expect(can(role, 'create:tag-out:any'), role).toBe(true);
    expect(can('member', 'clear:tag-out:own')).toBe(false);
    expect(can('instructor', 'clear:tag-out:own')).toBe(true);
    expect(can('instructor', 'clear:tag-out:any')).toBe(false);
    expect(can('admin', 'clear:tag-out:any')).toBe(true);
  });

  it('lets everyone reserve and cancel their own reservations, and only an admin cancel anyone’s', () => {
    for (const role of roles) {
      expect(can(role, 'create:reservation:own'), role).toBe(true);
      expect(can(role, 'cancel:reservation:own'), role).toBe(true);
    }
    expect(can('member', 'cancel:reservation:any')).toBe(false);
    expect(can('instructor', 'cancel:reservation:any')).toBe(false);
    expect(can('admin', 'cancel:reservation:any')).toBe(true);
  });

  it('lets instructors and admins see maintenance and mark it done, and only admins set tasks up', () => {
    expect(can('member', 'read:maintenance:any')).toBe(false);
    expect(can('member', 'complete:maintenance:any')).toBe(false);
    expect(can('instructor', 'read:maintenance:any')).toBe(true);
    expect(can('instructor', 'complete:maintenance:any')).toBe(true);
    expect(can('instructor', 'manage:maintenance:any')).toBe(false);
    expect(can('admin', 'manage:maintenance:any')).toBe(true);
  });

  it('lets instructors and admins read the list of tag-outs, and not members (who may still tag a machine out)', () => {
    expect(can('member', 'read:tag-out:any')).toBe(false);
    expect(can('member', 'create:tag-out:any')).toBe(true);
    expect(can('instructor', 'read:tag-out:any')).toBe(true);
    expect(can('admin', 'read:tag-out:any')).toBe(true);
  });

  it('lets an admin do everything in the permission list', () => {
    for (const permission of permissions) {
      expect(can('admin', permission), permission).toBe(true);
    }
  });

  it('maps every role to permissions from the list only', () => {
    for (const role of roles) {
      for (const permission of permissionsByRole[role]) {
        expect(permissions, `${role}: ${permission}`).toContain(permission);
      }
    }
  });
});
