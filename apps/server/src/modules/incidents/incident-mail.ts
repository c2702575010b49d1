import { incidentKindLabels } from '@chuckkey/core';
import type { Mail } from '../../lib/mailer';
import type { IncidentRow } from './incidents.repository';

interface ShopForMail {
  name: string;
  timeZone: string;
}

export function incidentPlace(row: Pick<IncidentRow, 'areaName' | 'location'>): string {
  return [row.areaName, row.location].filter(Boolean).join(' — ') || 'place not given';
}

/** The mail each active admin gets as soon as an injury is reported, so someone follows up the same day. */
export function injuryMail(to: { email: string; firstName: string }, row: IncidentRow, shop: ShopForMail, appUrl: string): Mail {
  const when = new Intl.DateTimeFormat('en-US', { dateStyle: 'full', timeStyle: 'short', timeZone: shop.timeZone }).format(row.occurredAt);
  const reporter = row.reporterFirstName ? `${row.reporterFirstName} ${row.reporterLastName ?? ''}`.trim() : 'a former member';
  const lines = [
    `Hello ${to.firstName},`,
    '',
    `${reporter} reported an injury at ${shop.name}.`,
    '',
    `When: ${when}`,
    `Where: ${incidentPlace(row)}`,
    ...(row.machineName ? [`Machine: ${row.machineName}`] : []),
    `Kind: ${incidentKindLabels[row.kind]}`,
    '',
    'What happened:',
    row.description,
    '',
    `First aid given: ${row.firstAid ?? 'none stated'}`,
    '',
    `Review the report: ${appUrl}/upkeep/incidents/${row.id}`,
    '',
    shop.name,
  ];
  return { to: to.email, subject: `Injury reported: ${row.machineName ?? incidentPlace(row)}`, text: lines.join('\n') };
}
