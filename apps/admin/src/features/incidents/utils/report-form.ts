import {
  INCIDENT_PHOTO_MAX_BYTES,
  INCIDENT_PHOTO_MAX_COUNT,
  INCIDENT_PHOTO_TYPES,
  incidentReportSchema,
  type IncidentReport,
  shopDate,
  wallClockInstant,
} from '@chuckkey/core';
import { z } from 'zod';
import { formatMegabytes } from '../../../lib/upload-file';

/** What the form's controls hold: text, with the time as the shop's wall clock ('YYYY-MM-DDTHH:MM'). */
export interface ReportFormValues {
  occurredAt: string;
  areaId: string;
  location: string;
  machineId: string;
  /** null while no radio button is chosen. */
  kind: string | null;
  description: string;
  firstAid: string;
}

const LOCAL_DATE_TIME = /^(\d{4}-\d{2}-\d{2})T(\d{2}:\d{2})/;

/** The instant a datetime-local value names on the shop's wall clock, or null when it names none. */
export function shopInstant(local: string, timeZone: string): string | null {
  const match = LOCAL_DATE_TIME.exec(local);
  if (!match) return null;
  const instant = wallClockInstant(match[1]!, match[2]!, timeZone);
  return Number.isNaN(instant.getTime()) ? null : instant.toISOString();
}

/** Now on the shop's wall clock, as a datetime-local value. */
export function shopNowLocal(timeZone: string, now: Date = new Date()): string {
  const clock = new Intl.DateTimeFormat('en-GB', { timeZone, hour: '2-digit', minute: '2-digit', hourCycle: 'h23' }).format(now);
  return `${shopDate(now, timeZone)}T${clock}`;
}

/**
 * The form's values read as the server's report schema reads them, so the errors under the
 * fields are the server's own words; the time is read on the shop's clock, not the device's.
 */
export function reportFormSchema(timeZone: string) {
  return z
    .object({
      occurredAt: z.string(),
      areaId: z.string(),
      location: z.string(),
      machineId: z.string(),
      kind: z.string().nullable(),
      description: z.string(),
      firstAid: z.string(),
    })
    .transform((values, ctx): IncidentReport => {
      const result = incidentReportSchema.safeParse({ ...values, kind: values.kind ?? '', occurredAt: shopInstant(values.occurredAt, timeZone) ?? '' });
      if (result.success) return result.data;
      for (const issue of result.error.issues) ctx.addIssue({ code: 'custom', message: issue.message, path: issue.path });
      return z.NEVER;
    });
}

export const emptyReportForm = (timeZone: string): ReportFormValues => ({
  occurredAt: shopNowLocal(timeZone),
  areaId: '',
  location: '',
  machineId: '',
  kind: '',
  description: '',
  firstAid: '',
});

export const photoLimitsText = `Up to ${INCIDENT_PHOTO_MAX_COUNT} photos, JPEG or PNG, each at most ${formatMegabytes(INCIDENT_PHOTO_MAX_BYTES)}.`;

/**
 * The photos chosen so far plus the new ones, and what was left out and why. The server checks
 * the content again; this catches a video or a sixth photo before anything is sent.
 */
export function addPhotos(current: readonly File[], added: readonly File[]): { photos: File[]; refused: string[] } {
  const photos = [...current];
  const refused: string[] = [];
  for (const file of added) {
    if (!(INCIDENT_PHOTO_TYPES as readonly string[]).includes(file.type)) {
      refused.push(`${file.name} is not a JPEG or PNG picture.`);
    } else if (file.size > INCIDENT_PHOTO_MAX_BYTES) {
      refused.push(`${file.name} is larger than ${formatMegabytes(INCIDENT_PHOTO_MAX_BYTES)}.`);
    } else if (photos.length >= INCIDENT_PHOTO_MAX_COUNT) {
      refused.push(`${file.name} was left out: a report takes at most ${INCIDENT_PHOTO_MAX_COUNT} photos.`);
    } else {
      photos.push(file);
    }
  }
  return { photos, refused };
}
