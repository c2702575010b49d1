import { z } from 'zod';

/** The reason codes a clearance decision can carry. They are contracts: the station, the API and the logs rely on them. */
export const clearanceCodes = [
  'membership_inactive',
  'waiver_missing',
  'sign_off_missing',
  'sign_off_expired',
  'sign_off_revoked',
  'supervisor_required',
  'tagged_out',
  'maintenance_overdue',
  'machine_in_use',
  'reservation_soon',
  'shop_closed',
  'crib_overdue',
  'balance_due',
] as const;
export const clearanceCodeSchema = z.enum(clearanceCodes);
export type ClearanceCode = z.infer<typeof clearanceCodeSchema>;

/** The server's answer when a scanned badge belongs to no one (or was revoked): no rule is checked and no member named. */
export const UNKNOWN_BADGE = 'unknown_badge';
export const unknownBadgeReason = {
  code: UNKNOWN_BADGE,
  message: 'This badge is not known here.',
  nextStep: 'Scan it again, or ask an admin for a new badge.',
} as const;

export const clearanceRules = [1, 2, 3, 4, 5, 6, 7, 8] as const;
export type ClearanceRule = (typeof clearanceRules)[number];
export const clearanceRuleSchema = z.literal(clearanceRules);

/** One sentence per rung of the rule ladder, as the station shows it beside the tick or cross. */
export const clearanceRuleTitles: Record<ClearanceRule, string> = {
  1: 'Membership active and safety waiver on file',
  2: 'Signed off on every training this machine needs',
  3: 'A supervisor on duty for a supervised sign-off',
  4: 'Machine in service and its maintenance done',
  5: 'No one else working on the machine',
  6: 'No one else’s reservation about to start',
  7: 'Shop open',
  8: 'Tool crib returns and balance in order',
};

export const reasonSchema = z.object({
  code: clearanceCodeSchema,
  rule: clearanceRuleSchema,
  message: z.string(),
  nextStep: z.string(),
});
export type ClearanceReason = z.infer<typeof reasonSchema>;

export const rungSchema = z.object({
  rule: clearanceRuleSchema,
  title: z.string(),
  passed: z.boolean(),
  reasons: z.array(reasonSchema),
});
export type ClearanceRung = z.infer<typeof rungSchema>;

export const clearanceDecisionSchema = z.object({
  cleared: z.boolean(),
  /** Every failing reason, in rule order. */
  reasons: z.array(reasonSchema),
  /** All eight rules, the failing rungs first, each group in rule order. */
  rungs: z.array(rungSchema).length(clearanceRules.length),
});
export type ClearanceDecision = z.infer<typeof clearanceDecisionSchema>;
