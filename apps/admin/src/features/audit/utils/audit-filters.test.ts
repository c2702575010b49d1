import { auditActions } from '@chuckkey/core';
import { describe, expect, it } from 'vitest';
import { actionLabel, auditActionLabels, auditCsvHref, auditFiltersToSearchParams, detailLines, readAuditFilters } from './audit-filters';

describe('audit log filters in the address', () => {
  it('reads the action and the page', () => {
    expect(readAuditFilters(new URLSearchParams('action=sign_off.revoked&page=3'))).toEqual({ action: 'sign_off.revoked', page: 3 });
  });

  it('drops an action it does not know and a page that is not one', () => {
    expect(readAuditFilters(new URLSearchParams('action=drop.tables&page=-2'))).toEqual({ page: 1 });
    expect(readAuditFilters(new URLSearchParams('page=2.5'))).toEqual({ page: 1 });
  });

  it('writes only what differs from the first page of everything', () => {
    expect(auditFiltersToSearchParams({ page: 1 }).toString()).toBe('');
    expect(auditFiltersToSearchParams({ action: 'badge.issued', page: 2 }).toString()).toBe('action=badge.issued&page=2');
  });

  it('exports every page of the chosen action', () => {
    expect(auditCsvHref({ action: 'waiver.accepted', page: 4 })).toBe('/api/audit?action=waiver.accepted&format=csv');
    expect(auditCsvHref({ page: 1 })).toBe('/api/audit?format=csv');
  });
});

describe('audit log words', () => {
  it('has plain words for every action the server records', () => {
    for (const action of auditActions) expect(auditActionLabels[action]).toMatch(/^[A-Z][a-z]/);
  });

  it('shows an action it has no words for as the server sends it', () => {
    expect(actionLabel('machine.repainted')).toBe('machine.repainted');
  });

  it('turns details into short lines', () => {
    expect(detailLines({ fromRole: 'member', to_role: 'instructor', checklist: ['a', 'b'], level: null })).toEqual([
      'From role: member',
      'To role: instructor',
      'Checklist: ["a","b"]',
      'Level: —',
    ]);
  });

  it('leaves out ids and writes instants as the page writes dates', () => {
    const lines = detailLines(
      { trainingId: 'a1', memberIds: ['b2'], trainingName: 'Band saw', expiresAt: '2027-03-01T06:00:00.000Z', via: 'web' },
      (iso) => `date(${iso.slice(0, 10)})`,
    );

    expect(lines).toEqual(['Training name: Band saw', 'Expires at: date(2027-03-01)', 'Via: web']);
  });
});
