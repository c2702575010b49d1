import { z } from 'zod';

export const auditActions = [
  'sign_off.created',
  'sign_off.revoked',
  'member.role_changed',
  'member.deactivated',
  'member.reactivated',
  'badge.issued',
  'waiver.accepted',
  'waiver.scan_uploaded',
  'waiver.published',
  'station.created',
  'station.paired',
  'station.revoked',
  'shop.hours_changed',
  'shop.closure_added',
  'shop.closure_removed',
  'shop.policies_changed',
  'machine.tagged_out',
  'machine.tag_out_cleared',
  'reservation.created',
  'reservation.cancelled',
  'reservation.no_show',
  'reservation.released',
  'machine.reservation_rules_changed',
  'class.created',
  'class.members_changed',
  'class.cancelled',
  'class.occurrence_cancelled',
  'crib.item_created',
  'crib.item_updated',
  'crib.checked_out',
  'crib.returned',
  'crib.items_imported',
  'crib.item_restored',
  'incident.reported',
  'incident.status_changed',
  'incident.note_added',
  'maintenance.task_created',
  'maintenance.task_updated',
  'maintenance.completed',
] as const;
export type AuditAction = (typeof auditActions)[number];

export const auditEntrySchema = z.object({
  id: z.number().int(),
  at: z.string(),
  action: z.string(),
  actor: z.object({ id: z.uuid(), name: z.string() }).nullable(),
  member: z.object({ id: z.uuid(), name: z.string() }).nullable(),
  entity: z.string(),
  entityId: z.string(),
  details: z.record(z.string(), z.unknown()),
});
export type AuditEntry = z.infer<typeof auditEntrySchema>;

export const auditQuerySchema = z.object({
  action: z.enum(auditActions).optional(),
  memberId: z.uuid().optional(),
  page: z.coerce.number().int().min(1).default(1),
  pageSize: z.coerce.number().int().min(1).max(100).default(50),
  format: z.enum(['json', 'csv']).default('json'),
});
export type AuditQuery = z.infer<typeof auditQuerySchema>;

export const auditPageSchema = z.object({ items: z.array(auditEntrySchema), total: z.number().int() });
export type AuditPage = z.infer<typeof auditPageSchema>;
