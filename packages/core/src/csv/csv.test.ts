import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import { toCsv, type CsvColumn } from './csv';

interface Row {
  a: string;
  b: string | number | boolean | null | undefined;
}
const columns: CsvColumn<Row>[] = [
  { header: 'A', value: (r) => r.a },
  { header: 'B', value: (r) => r.b },
];

function parsed(csv: string): string[][] {
  // RFC 4180, parsed back with papaparse as the independent reader.
  const result = Papa.parse<string[]>(csv, { delimiter: ',', newline: '\r\n', quoteChar: '"', skipEmptyLines: false });
  expect(result.errors).toEqual([]);
  return result.data;
}

describe('toCsv()', () => {
  it('writes a header line and ends every record, the last one too, with CRLF', () => {
    const csv = toCsv([{ a: 'one', b: 'two' }], columns);
    // RFC 4180 §2.1–2.3: records end with CRLF; the header is a record like the others.
    expect(csv).toBe('A,B\r\none,two\r\n');
  });

  it('with no rows, writes the header alone', () => {
    expect(toCsv([], columns)).toBe('A,B\r\n');
  });

  it('quotes a field with a comma and doubles the quotes inside a field', () => {
    const csv = toCsv([{ a: 'Reyes, Jr.', b: 'the "big" lathe' }], columns);
    // RFC 4180 §2.6–2.7: such fields are enclosed in double quotes; a quote inside is doubled.
    expect(csv).toBe('A,B\r\n"Reyes, Jr.","the ""big"" lathe"\r\n');
    expect(parsed(csv).slice(1, 2)).toEqual([['Reyes, Jr.', 'the "big" lathe']]);
  });

  it('keeps CR and LF inside a field as part of the field, not as a record end', () => {
    const csv = toCsv([{ a: 'line one\r\nline two', b: 'bare\nfeed' }, { a: 'x', b: 'carriage\rreturn' }], columns);
    // RFC 4180 §2.6: line breaks inside a quoted field belong to the field.
    const records = parsed(csv);
    expect(records.slice(0, 3)).toEqual([
      ['A', 'B'],
      ['line one\r\nline two', 'bare\nfeed'],
      ['x', 'carriage\rreturn'],
    ]);
  });

  it('gives every record the same number of fields, empty for null and undefined', () => {
    const csv = toCsv(
      [
        { a: 'first', b: null },
        { a: 'second, with comma', b: undefined },
        { a: '"quoted"', b: 42 },
        { a: '', b: true },
      ],
      columns,
    );
    expect(csv.endsWith('\r\n')).toBe(true);
    // RFC 4180 §2.4: each line has the same number of fields; the final CRLF leaves one empty line.
    const records = parsed(csv);
    expect(records.at(-1)).toEqual(['']);
    const body = records.slice(0, -1);
    expect(body).toHaveLength(5);
    for (const record of body) expect(record).toHaveLength(2);
    expect(body.slice(1)).toEqual([
      ['first', ''],
      ['second, with comma', ''],
      ['"quoted"', '42'],
      ['', 'true'],
    ]);
  });

  it.each(['=', '+', '-', '@'])('neutralises a text cell starting with %s so a spreadsheet does not run it', (start) => {
    const value = `${start}HYPERLINK("http://evil.test","x")`;
    const csv = toCsv([{ a: value, b: 'ok' }], columns);
    // OWASP "CSV Injection": prefix a single quote to cells that start with = + - @.
    const [, record] = parsed(csv);
    expect(record).toEqual([`'${value}`, 'ok']);
  });

  it('neutralises a text cell starting with a tab or a carriage return', () => {
    const csv = toCsv([{ a: '\t=1+1', b: '\r=1+1' }], columns);
    // OWASP "CSV Injection" also lists tab (0x09) and carriage return (0x0D).
    const [, record] = parsed(csv);
    expect(record).toEqual(["'\t=1+1", "'\r=1+1"]);
  });

  it('leaves text with a formula character further in, and plain numbers, as they are', () => {
    const csv = toCsv([{ a: 'a=b+c', b: -3 }], columns);
    const [, record] = parsed(csv);
    expect(record).toEqual(['a=b+c', '-3']);
  });
});
