import { describe, expect, it } from 'vitest';
import { itemFormSchema, toDraft } from './item-form';

const blank = toDraft(undefined);

describe('the crib item form', () => {
  it('turns a tool’s fields into the API’s input, a blank loan period meaning the shop’s closing time', () => {
    const result = itemFormSchema.parse({ ...blank, name: ' Bore gauge 18–35 mm ', assetTag: 'BG-01', binLocation: 'A2' });
    expect(result).toEqual({
      kind: 'tool',
      name: 'Bore gauge 18–35 mm',
      assetTag: 'BG-01',
      serialNumber: null,
      binLocation: 'A2',
      condition: 'good',
      inCirculation: true,
      loanPeriodHours: null,
    });
  });

  it('turns a consumable’s fields into counts and a price in cents', () => {
    const result = itemFormSchema.parse({ ...blank, kind: 'consumable', name: 'Carbide insert', unit: 'each', stock: '40', reorderLevel: '10', priceCents: '6.25' });
    expect(result).toEqual({ kind: 'consumable', name: 'Carbide insert', binLocation: null, unit: 'each', stock: 40, reorderLevel: 10, priceCents: 625, inCirculation: true });
  });

  it('puts the schema’s messages under the fields they concern', () => {
    const result = itemFormSchema.safeParse({ ...blank, kind: 'consumable', name: 'Inserts', unit: '', stock: '2.5', priceCents: '1' });
    expect(result.success).toBe(false);
    const paths = result.error?.issues.map((issue) => issue.path.join('.'));
    expect(paths).toEqual(expect.arrayContaining(['unit', 'stock']));
  });

  it('refuses a price that is not an amount, under the price', () => {
    const result = itemFormSchema.safeParse({ ...blank, kind: 'consumable', name: 'Inserts', unit: 'each', stock: '2', priceCents: 'free' });
    expect(result.error?.issues.map((issue) => issue.path.join('.'))).toEqual(['priceCents']);
  });

  it('fills the form from a saved consumable, its price back in money', () => {
    const draft = toDraft({
      id: '00000000-0000-4000-8000-000000000001',
      kind: 'consumable',
      name: 'Flap disc',
      binLocation: null,
      assetTag: null,
      serialNumber: null,
      condition: null,
      inCirculation: true,
      loanPeriodHours: null,
      unit: 'each',
      stock: 7,
      reorderLevel: null,
      priceCents: 450,
      available: true,
      hasPhoto: false,
    });
    expect(draft).toMatchObject({ kind: 'consumable', stock: '7', reorderLevel: '', priceCents: '4.50', condition: 'good' });
  });
});
