import { z } from 'zod';

/** A person has exactly one role; instructors and admins are members too. */
export const roles = ['member', 'instructor', 'admin'] as const;
export const roleSchema = z.enum(roles);
export type Role = z.infer<typeof roleSchema>;

export const roleLabels: Record<Role, string> = {
  member: 'Member',
  instructor: 'Instructor',
  admin: 'Admin',
};

/**
 * Permissions are data: `action:entity:scope`. The server enforces them with
 * `requirePermission`; the web app only uses them to hide what a person cannot do.
 */
export const permissions = [
  'read:profile:own',
  'update:profile:own',
  'read:machine:any',
  'read:member:any',
  'update:member:any',
  'create:invitation:any',
  'read:invitation:any',
  'read:outbox:any',
] as const;
export type Permission = (typeof permissions)[number];

const memberPermissions: readonly Permission[] = [
  'read:profile:own',
  'update:profile:own',
  'read:machine:any',
];

export const permissionsByRole: Record<Role, readonly Permission[]> = {
  member: memberPermissions,
  instructor: [...memberPermissions],
  admin: [...permissions],
};

export function can(role: Role, permission: Permission): boolean {
  return permissionsByRole[role].includes(permission);
}
