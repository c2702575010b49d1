import { cribConditionSchema, cribItemInputSchema, cribItemKinds, type CribItem } from '@chuckkey/core';
import { z } from 'zod';
import { formatPrice, parsePrice } from './inventory';

/**
 * What the form holds: text as typed, one field for every column of both kinds, so switching the
 * kind back and forth loses nothing. On submit it becomes the API's `CribItemInput`, checked by
 * the same schema as the server's, so the errors and their field names are the server's too.
 */
const draftSchema = z.object({
  kind: z.enum(cribItemKinds),
  name: z.string(),
  assetTag: z.string(),
  serialNumber: z.string(),
  binLocation: z.string(),
  condition: cribConditionSchema,
  inCirculation: z.boolean(),
  loanPeriodHours: z.string(),
  unit: z.string(),
  stock: z.string(),
  reorderLevel: z.string(),
  priceCents: z.string(),
});
export type ItemDraft = z.infer<typeof draftSchema>;

export const itemFormFields = [
  'kind',
  'name',
  'assetTag',
  'serialNumber',
  'binLocation',
  'condition',
  'inCirculation',
  'loanPeriodHours',
  'unit',
  'stock',
  'reorderLevel',
  'priceCents',
] as const satisfies readonly (keyof ItemDraft)[];

// A blank box is "none"; anything else goes to the schema as a number, so "2.5" or "ten" earn its own message.
const optionalNumber = (text: string) => (text.trim() === '' ? null : Number(text));
const requiredNumber = (text: string) => (text.trim() === '' ? undefined : Number(text));

export const itemFormSchema = draftSchema
  .transform((draft, ctx): unknown => {
    if (draft.kind === 'tool') {
      return {
        kind: 'tool',
        name: draft.name,
        assetTag: draft.assetTag,
        serialNumber: draft.serialNumber,
        binLocation: draft.binLocation,
        condition: draft.condition,
        inCirculation: draft.inCirculation,
        loanPeriodHours: optionalNumber(draft.loanPeriodHours),
      };
    }
    const priceCents = parsePrice(draft.priceCents);
    if (priceCents === null) {
      ctx.addIssue({ code: 'custom', path: ['priceCents'], message: 'Give the price of one unit as an amount, such as 4.50.' });
      return z.NEVER;
    }
    return {
      kind: 'consumable',
      name: draft.name,
      binLocation: draft.binLocation,
      unit: draft.unit,
      stock: requiredNumber(draft.stock),
      reorderLevel: optionalNumber(draft.reorderLevel),
      priceCents,
      inCirculation: draft.inCirculation,
    };
  })
  .pipe(cribItemInputSchema);

export function toDraft(item: CribItem | undefined): ItemDraft {
  return {
    kind: item?.kind ?? 'tool',
    name: item?.name ?? '',
    assetTag: item?.assetTag ?? '',
    serialNumber: item?.serialNumber ?? '',
    binLocation: item?.binLocation ?? '',
    condition: item?.condition ?? 'good',
    inCirculation: item?.inCirculation ?? true,
    loanPeriodHours: item?.loanPeriodHours?.toString() ?? '',
    unit: item?.unit ?? '',
    stock: item?.stock?.toString() ?? '',
    reorderLevel: item?.reorderLevel?.toString() ?? '',
    priceCents: item?.priceCents === null || item?.priceCents === undefined ? '' : formatPrice(item.priceCents),
  };
}
