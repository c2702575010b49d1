import { auditActions, type AuditAction } from '@chuckkey/core';
import { apiHref } from '../../../lib/api-client';

export const AUDIT_PAGE_SIZE = 50;

export interface AuditFilters {
  action?: AuditAction;
  page: number;
}

export const auditActionLabels: Record<AuditAction, string> = {
  'sign_off.created': 'Sign-off given',
  'sign_off.revoked': 'Sign-off revoked',
  'member.role_changed': 'Role changed',
  'member.deactivated': 'Member deactivated',
  'member.reactivated': 'Member reactivated',
  'badge.issued': 'Badge issued',
  'waiver.accepted': 'Waiver accepted',
  'waiver.scan_uploaded': 'Waiver scan uploaded',
  'waiver.published': 'Waiver published',
  'station.created': 'Station added',
  'station.paired': 'Station paired',
  'station.revoked': 'Station revoked',
  'shop.hours_changed': 'Opening hours changed',
  'shop.closure_added': 'Closure added',
  'shop.closure_removed': 'Closure removed',
  'shop.policies_changed': 'Shop policies changed',
  'machine.tagged_out': 'Machine tagged out',
  'machine.tag_out_cleared': 'Tag-out cleared',
  'reservation.created': 'Reservation made',
  'reservation.cancelled': 'Reservation cancelled',
  'reservation.no_show': 'Reservation released as a no-show',
  'reservation.released': 'Rest of a reservation given back',
  'machine.reservation_rules_changed': 'Booking rules changed',
  'class.created': 'Class scheduled',
  'class.members_changed': 'Class members changed',
  'class.cancelled': 'Class cancelled',
  'class.occurrence_cancelled': 'Class meeting cancelled',
  'crib.item_created': 'Crib item added',
  'crib.item_updated': 'Crib item changed',
  'crib.checked_out': 'Crib item checked out',
  'crib.returned': 'Crib item returned',
  'crib.items_imported': 'Crib inventory imported',
  'crib.item_restored': 'Crib tool back in circulation',
  'maintenance.task_created': 'Maintenance task added',
  'maintenance.task_updated': 'Maintenance task changed',
  'maintenance.completed': 'Maintenance done',
  'incident.reported': 'Incident reported',
  'incident.status_changed': 'Incident status changed',
  'incident.note_added': 'Incident note added',
};

export function isAuditAction(value: string | null): value is AuditAction {
  return value !== null && (auditActions as readonly string[]).includes(value);
}

/** Entries can name actions added after this page was written; those show as the server words them. */
export function actionLabel(action: string): string {
  return isAuditAction(action) ? auditActionLabels[action] : action;
}

/** The filter and page live in the address, so a view of the log can be linked; anything mangled falls back. */
export function readAuditFilters(params: URLSearchParams): AuditFilters {
  const action = params.get('action');
  const page = Number(params.get('page'));
  return {
    ...(isAuditAction(action) ? { action } : {}),
    page: Number.isInteger(page) && page >= 1 ? page : 1,
  };
}

export function auditFiltersToSearchParams(filters: AuditFilters): URLSearchParams {
  const params = new URLSearchParams();
  if (filters.action) params.set('action', filters.action);
  if (filters.page > 1) params.set('page', String(filters.page));
  return params;
}

/** The export holds every entry of the chosen action, not just the page on screen. */
export function auditCsvHref(filters: AuditFilters): string {
  return apiHref('/audit', { action: filters.action, format: 'csv' });
}

function words(key: string): string {
  const spaced = key.replace(/([a-z0-9])([A-Z])/g, '$1 $2').replace(/[_-]+/g, ' ').trim().toLowerCase();
  return spaced.charAt(0).toUpperCase() + spaced.slice(1);
}

const ISO_INSTANT = /^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}/;

function valueText(value: unknown, instant: (iso: string) => string): string {
  if (value === null || value === undefined) return '—';
  if (typeof value === 'string') return ISO_INSTANT.test(value) ? instant(value) : value;
  if (typeof value === 'number' || typeof value === 'boolean') return String(value);
  return JSON.stringify(value);
}

/**
 * An entry's details as short lines of plain words: { fromRole: "member" } → "From role: member".
 * Ids are left out (the entry links its member already) and instants are written as dates.
 */
export function detailLines(details: Record<string, unknown>, instant: (iso: string) => string = (iso) => iso): string[] {
  return Object.entries(details)
    .filter(([key]) => !/(^id|Id|Ids|_id|_ids)$/.test(key))
    .map(([key, value]) => `${words(key)}: ${valueText(value, instant)}`);
}
