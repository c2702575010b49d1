export interface CsvColumn<T> {
  header: string;
  value: (row: T) => string | number | boolean | null | undefined;
}

// OWASP "CSV Injection": a cell starting with one of these is run as a formula by spreadsheets.
const FORMULA_START = /^[=+\-@\t\r]/;

function cell(raw: string | number | boolean | null | undefined): string {
  if (raw === null || raw === undefined) return '';
  let text = String(raw);
  if (typeof raw === 'string' && FORMULA_START.test(text)) text = `'${text}`;
  // RFC 4180 §2.6–2.7: fields with commas, quotes or line breaks are quoted; quotes doubled.
  return /[",\r\n]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}

/** RFC 4180 CSV: a header line, CRLF after every record, the same field count on every line. */
export function toCsv<T>(rows: readonly T[], columns: readonly CsvColumn<T>[]): string {
  const lines = [columns.map((c) => cell(c.header)).join(',')];
  for (const row of rows) lines.push(columns.map((c) => cell(c.value(row))).join(','));
  return lines.join('\r\n') + '\r\n';
}
