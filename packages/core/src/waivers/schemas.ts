import { z } from 'zod';

export const waiverVersionSchema = z.object({
  version: z.number().int(),
  title: z.string(),
  body: z.string(),
  publishedAt: z.string(),
});
export type WaiverVersion = z.infer<typeof waiverVersionSchema>;

export const waiverStatusSchema = z.object({
  current: waiverVersionSchema.nullable(),
  /** The member's record for the current version, if any. */
  record: z
    .object({
      id: z.uuid(),
      version: z.number().int(),
      method: z.enum(['accepted_online', 'uploaded_scan']),
      typedName: z.string().nullable(),
      recordedAt: z.string(),
    })
    .nullable(),
  onFile: z.boolean(),
});
export type WaiverStatus = z.infer<typeof waiverStatusSchema>;

export const waiverAcceptSchema = z.object({
  version: z.coerce.number().int().min(1),
  typedName: z.string().trim().min(2, { error: 'Type your full name.' }).max(160),
});
export type WaiverAccept = z.infer<typeof waiverAcceptSchema>;

export const waiverPublishSchema = z.object({
  title: z.string().trim().min(1, { error: 'Give the waiver a title.' }).max(200),
  body: z.string().trim().min(20, { error: 'Write the waiver text.' }).max(50_000),
});
export type WaiverPublish = z.infer<typeof waiverPublishSchema>;

/** Typed name must be the member's full name, ignoring case and extra spaces. */
export function typedNameMatches(typed: string, fullName: string): boolean {
  const norm = (s: string) => s.normalize('NFKC').trim().replace(/\s+/g, ' ').toLocaleLowerCase();
  return norm(typed) === norm(fullName);
}
