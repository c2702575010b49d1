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
  'read:training:any',
  'read:sign-off:own',
  'read:badge:own',
  'update:pin:own',
  'update:photo:own',
  'accept:waiver:own',
  'search:member:any',
  'create:sign-off:any',
  'revoke:sign-off:any',
  'read:sign-off:any',
  'read:photo:any',
  'read:member:any',
  'update:member:any',
  'create:invitation:any',
  'read:invitation:any',
  'read:outbox:any',
  'manage:machine:any',
  'manage:training:any',
  'report:sign-off:any',
  'manage:badge:any',
  'manage:waiver:any',
  'manage:station:any',
  'manage:shop:any',
  'read:audit:any',
  'create:tag-out:any',
  'clear:tag-out:own',
  'clear:tag-out:any',
  'read:tag-out:any',
  'create:reservation:own',
  'cancel:reservation:own',
  'cancel:reservation:any',
  'manage:class:any',
  'cancel:class:any',
  'read:crib:any',
  'read:crib-checkout:own',
  'manage:crib:any',
  'read:report:any',
  'create:incident:own',
  'read:incident:own',
  'read:incident:any',
  'review:incident:any',
  'read:maintenance:any',
  'complete:maintenance:any',
  'manage:maintenance:any',
] as const;
export type Permission = (typeof permissions)[number];

const memberPermissions: readonly Permission[] = [
  'read:profile:own',
  'update:profile:own',
  'read:machine:any',
  'read:training:any',
  'read:sign-off:own',
  'read:badge:own',
  'update:pin:own',
  'update:photo:own',
  'accept:waiver:own',
  // Whoever finds a machine unsafe may take it out of service.
  'create:tag-out:any',
  'create:reservation:own',
  'cancel:reservation:own',
  // Members look up what the crib holds and what they have out; admins keep the crib and record loans.
  'read:crib:any',
  'read:crib-checkout:own',
  // Anyone who sees something happen may report it, and read back what they reported; admins
  // read every report and review it.
  'create:incident:own',
  'read:incident:own',
];

/**
 * Instructors sign members off, so they may find members and read their sign-offs, and see
 * their photos to be sure who stands in front of them.
 */
const instructorPermissions: readonly Permission[] = [
  ...memberPermissions,
  'search:member:any',
  'create:sign-off:any',
  'revoke:sign-off:any',
  'read:sign-off:any',
  'read:photo:any',
  // Their own tag-outs only: the machine's fault was theirs to judge, and is theirs to judge fixed.
  'clear:tag-out:own',
  // They see which machines are out of service and why, to find the ones they tagged and clear them.
  'read:tag-out:any',
  // They hold machines for the classes they teach and book members in; cancelling one is its holder's
  // call (or an admin's, through 'cancel:class:any').
  'manage:class:any',
  // They are on the floor when a machine comes due: they see what is due and record the work done.
  // Setting up and changing the tasks stays with admins.
  'read:maintenance:any',
  'complete:maintenance:any',
];

export const permissionsByRole: Record<Role, readonly Permission[]> = {
  member: memberPermissions,
  instructor: instructorPermissions,
  admin: [...permissions],
};

export function can(role: Role, permission: Permission): boolean {
  return permissionsByRole[role].includes(permission);
}
