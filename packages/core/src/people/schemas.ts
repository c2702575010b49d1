import { z } from 'zod';
import { emailSchema, newPasswordSchema, tokenSchema } from '../auth/schemas';
import { roleSchema } from './roles';

const nameSchema = z
  .string({ error: 'Enter a name.' })
  .trim()
  .min(1, { error: 'Enter a name.' })
  .max(80, { error: 'Use at most 80 characters.' });

export const firstNameSchema = nameSchema;
export const lastNameSchema = nameSchema;

export const memberSchema = z.object({
  id: z.uuid(),
  email: z.string(),
  firstName: z.string(),
  lastName: z.string(),
  name: z.string(),
  role: roleSchema,
  active: z.boolean(),
  createdAt: z.string(),
});
export type Member = z.infer<typeof memberSchema>;

export const PAGE_SIZE_MAX = 100;
export const memberSortFields = ['name', 'email', 'role', 'createdAt'] as const;

export const memberListQuerySchema = z.object({
  search: z.string().trim().max(100, { error: 'Use at most 100 characters.' }).optional(),
  role: roleSchema.optional(),
  page: z.coerce.number({ error: 'Give a page number.' }).int().min(1, { error: 'Pages start at 1.' }).default(1),
  pageSize: z.coerce
    .number({ error: 'Give a page size.' })
    .int()
    .min(1, { error: 'Show at least 1 row.' })
    .max(PAGE_SIZE_MAX, { error: `Show at most ${PAGE_SIZE_MAX} rows.` })
    .default(25),
  sort: z.enum(memberSortFields).default('name'),
  order: z.enum(['asc', 'desc']).default('asc'),
});
export type MemberListQuery = z.infer<typeof memberListQuerySchema>;

export function pageSchema<T extends z.ZodType>(item: T) {
  return z.object({
    items: z.array(item),
    total: z.number().int(),
    page: z.number().int(),
    pageSize: z.number().int(),
  });
}
export const memberPageSchema = pageSchema(memberSchema);
export type MemberPage = z.infer<typeof memberPageSchema>;

export const memberUpdateSchema = z
  .object({
    role: roleSchema.optional(),
    active: z.boolean().optional(),
  })
  .refine((v) => v.role !== undefined || v.active !== undefined, {
    error: 'Change the role or the active state.',
  });
export type MemberUpdate = z.infer<typeof memberUpdateSchema>;

export const idParamsSchema = z.object({ id: z.uuid({ error: 'Not a valid id.' }) });

export const profileUpdateSchema = z.object({
  firstName: firstNameSchema,
  lastName: lastNameSchema,
  email: emailSchema,
});
export type ProfileUpdate = z.infer<typeof profileUpdateSchema>;

export const profileSchema = z.object({
  id: z.uuid(),
  email: z.string(),
  firstName: z.string(),
  lastName: z.string(),
  name: z.string(),
  role: roleSchema,
});
export type Profile = z.infer<typeof profileSchema>;

export const invitationCreateSchema = z.object({
  email: emailSchema,
  firstName: firstNameSchema,
  lastName: lastNameSchema,
  role: roleSchema.default('member'),
});
export type InvitationCreate = z.infer<typeof invitationCreateSchema>;
export type InvitationCreateInput = z.input<typeof invitationCreateSchema>;

export const invitationSchema = z.object({
  id: z.uuid(),
  email: z.string(),
  firstName: z.string(),
  lastName: z.string(),
  role: roleSchema,
  invitedBy: z.string(),
  expiresAt: z.string(),
  createdAt: z.string(),
});
export type Invitation = z.infer<typeof invitationSchema>;

export const invitationPreviewSchema = z.object({
  email: z.string(),
  firstName: z.string(),
  lastName: z.string(),
  shopName: z.string(),
});
export type InvitationPreview = z.infer<typeof invitationPreviewSchema>;

export const invitationAcceptSchema = z.object({
  token: tokenSchema,
  password: newPasswordSchema,
});
export type InvitationAccept = z.infer<typeof invitationAcceptSchema>;

export const tokenParamsSchema = z.object({ token: tokenSchema });

export function fullName(firstName: string, lastName: string): string {
  return `${firstName} ${lastName}`.trim();
}

/** What the public wall board may show of a person: first name and last initial. */
export function publicName(firstName: string, lastName: string): string {
  const initial = lastName.trim().charAt(0);
  return initial ? `${firstName} ${initial.toUpperCase()}.` : firstName;
}

export const invitationAcceptedSchema = z.object({ email: z.string() });
