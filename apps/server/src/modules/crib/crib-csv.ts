import { cribCsvColumns, cribItemInputSchema, toCsv, type CribItem, type CribItemInput } from '@chuckkey/core';
import Papa from 'papaparse';
import { z } from 'zod';
import { badRequest } from '../../lib/errors';
import { zodFieldErrors } from '../../lib/validate';

type Column = (typeof cribCsvColumns)[number];

const cellOf: Record<Column, (item: CribItem) => string | number | boolean | null> = {
  id: (item) => item.id,
  kind: (item) => item.kind,
  name: (item) => item.name,
  asset_tag: (item) => item.assetTag,
  serial_number: (item) => item.serialNumber,
  bin_location: (item) => item.binLocation,
  condition: (item) => item.condition,
  in_circulation: (item) => item.inCirculation,
  loan_period_hours: (item) => item.loanPeriodHours,
  unit: (item) => item.unit,
  stock: (item) => item.stock,
  reorder_level: (item) => item.reorderLevel,
  price_cents: (item) => item.priceCents,
};

export function cribItemsCsv(items: readonly CribItem[]): string {
  return toCsv(
    items,
    cribCsvColumns.map((header) => ({ header, value: cellOf[header] })),
  );
}

// toCsv() puts an apostrophe before a cell that a spreadsheet would run as a formula; reading our
// own export back drops it again, so names that start with such a character survive a round trip.
const FORMULA_GUARD = /^'[=+\-@\t\r]/;
const text = (raw: string | undefined) => {
  const value = raw ?? '';
  return FORMULA_GUARD.test(value) ? value.slice(1) : value;
};
const optional = (raw: string | undefined) => (text(raw) === '' ? null : text(raw));
const number = (raw: string | undefined) => (text(raw).trim() === '' ? null : Number(text(raw)));

export interface CribImportRow {
  id: string | null;
  input: CribItemInput;
}

/** Reads the whole file before anything is written: one bad row refuses the import, naming every error by its line. */
export function readCribItemsCsv(csv: string): CribImportRow[] {
  // RFC 4180 through papaparse: quoted fields may hold commas, doubled quotes and line breaks;
  // blank lines (a final line break among them) are no records.
  const parsed = Papa.parse<string[]>(csv, { header: false, skipEmptyLines: 'greedy' });
  const broken = parsed.errors[0];
  if (broken) throw badRequest('csv_unreadable', `The file is not readable CSV${broken.row === undefined ? '' : ` at record ${broken.row + 1}`}: ${broken.message}.`);
  const records = parsed.data;
  const [header, ...rows] = records;
  const missing = cribCsvColumns.filter((column) => !header?.includes(column));
  if (!header || missing.length > 0) throw badRequest('csv_columns', `The header line lacks: ${missing.join(', ')}.`);
  const at = (row: string[], column: Column) => row[header.indexOf(column)];

  const errors: Record<string, string[]> = {};
  const read: CribImportRow[] = [];
  rows.forEach((row, index) => {
    // Line 1 is the header; a row's line counts records, not physical lines within quoted fields.
    const line = index + 2;
    const kind = text(at(row, 'kind'));
    const raw = {
      kind,
      name: text(at(row, 'name')),
      binLocation: optional(at(row, 'bin_location')),
      inCirculation: text(at(row, 'in_circulation')) !== 'false',
      ...(kind === 'tool'
        ? {
            assetTag: text(at(row, 'asset_tag')),
            serialNumber: optional(at(row, 'serial_number')),
            condition: optional(at(row, 'condition')) ?? undefined,
            loanPeriodHours: number(at(row, 'loan_period_hours')),
          }
        : {
            unit: text(at(row, 'unit')),
            stock: number(at(row, 'stock')) ?? undefined,
            reorderLevel: number(at(row, 'reorder_level')),
            priceCents: number(at(row, 'price_cents')) ?? undefined,
          }),
    };
    const id = optional(at(row, 'id'));
    const parsedId = id === null ? null : z.uuid().safeParse(id.trim());
    if (parsedId && !parsedId.success) (errors[`line ${line}.id`] ??= []).push('The id is not one this crib gave out.');
    const parsed = cribItemInputSchema.safeParse(raw);
    if (!parsed.success) {
      for (const [field, messages] of Object.entries(zodFieldErrors(parsed.error))) (errors[`line ${line}.${field}`] ??= []).push(...messages);
      return;
    }
    read.push({ id: parsedId?.success ? parsedId.data : null, input: parsed.data });
  });
  if (Object.keys(errors).length > 0) throw badRequest('csv_rows_invalid', 'Some rows of the file are not valid items; nothing was imported.', errors);
  return read;
}
