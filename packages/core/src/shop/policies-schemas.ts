import { z } from 'zod';

/** The longest block admins can set: a year overdue is a tool lost, not a reminder. */
export const OVERDUE_CHECKOUT_BLOCK_DAYS_MAX = 365;

const blockDaysMessage = `Give a whole number of days from 0 to ${OVERDUE_CHECKOUT_BLOCK_DAYS_MAX}.`;

/**
 * GET and PUT /api/shop/policies. `overdueCheckoutBlockDays`: a member whose crib tool is overdue
 * by more than this many days cannot start a machine (rule 8); null turns the policy off.
 */
export const shopPoliciesSchema = z.object({
  overdueCheckoutBlockDays: z
    .number({ error: blockDaysMessage })
    .int({ error: blockDaysMessage })
    .min(0, { error: blockDaysMessage })
    .max(OVERDUE_CHECKOUT_BLOCK_DAYS_MAX, { error: blockDaysMessage })
    .nullable(),
});
export type ShopPolicies = z.infer<typeof shopPoliciesSchema>;
