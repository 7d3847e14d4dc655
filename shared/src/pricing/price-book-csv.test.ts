import fc from 'fast-check';
import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import { demoPriceBook } from './demo-price-book';
import { CSV_COLUMNS, priceBookFromCsv, priceBookToCsv } from './price-book-csv';
import { priceBookSchema, type PriceBook } from './price-book-schema';

/** The CSV as rows of cells keyed by column, to edit in tests as a spreadsheet user would. */
function rows(csv: string): Array<Record<string, string>> {
  return Papa.parse<Record<string, string>>(csv, { header: true, skipEmptyLines: true }).data;
}
function csvOf(data: Array<Record<string, string>>): string {
  return Papa.unparse({
    fields: [...CSV_COLUMNS],
    data: data.map((row) => CSV_COLUMNS.map((c) => row[c] ?? '')),
  });
}

describe('price book CSV', () => {
  it('writes one row per item and value under one header', () => {
    const book = demoPriceBook();
    const csv = priceBookToCsv(book);
    const lines = csv.split('\r\n');
    expect(lines[0]).toBe(CSV_COLUMNS.join(','));
    const table = rows(csv);
    expect(table.filter((row) => row.section === 'material')).toHaveLength(book.materials.length);
    const pump = table.find((row) => row.code === 'demo-low-2000')!;
    expect(pump.pumpCurve).toBe('0:14:165|500:12:165|1200:8:160|1650:4:155|2000:0:150');
    expect(pump.taxable).toBe('yes');
    expect(table.find((row) => row.key === 'taskRole.excavation')!.value).toBe('INSTALLER');
    expect(table.find((row) => row.key === 'markupPct.labor')!.value).toBe('55');
  });

  it('reads back the same book', () => {
    const book = demoPriceBook();
    const result = priceBookFromCsv(priceBookToCsv(book));
    expect(result).toEqual({ ok: true, book: priceBookSchema.parse(book) });
  });

  it('reads columns in any order, blank lines and a byte-order mark', () => {
    const book = demoPriceBook();
    const table = rows(priceBookToCsv(book));
    const reversed = [...CSV_COLUMNS].reverse();
    const csv =
      '\uFEFF' +
      Papa.unparse({
        fields: reversed,
        data: table.map((row) => reversed.map((c) => row[c] ?? '')),
      }).replace('\r\n', '\r\n\r\n');
    expect(priceBookFromCsv(csv)).toEqual({ ok: true, book });
  });

  it('keeps names with commas, quotes, line breaks and leading formula signs', () => {
    const book = demoPriceBook();
    book.materials[0] = { ...book.materials[0]!, name: '=Liner, "45" mil\nsecond line' };
    book.laborRoles[0] = { ...book.laborRoles[0]!, name: '+Lead, senior' };
    const csv = priceBookToCsv(book);
    // A spreadsheet would not run these as formulas.
    expect(csv).toContain(`"'=Liner, ""45"" mil\nsecond line"`);
    expect(priceBookFromCsv(csv)).toEqual({ ok: true, book });
  });

  it('round-trips generated books', () => {
    const text = fc
      .string({ minLength: 1, maxLength: 30 })
      .map((s) => s.trim())
      .filter((s) => s.length > 0);
    fc.assert(
      fc.property(
        fc.array(fc.tuple(text, fc.integer({ min: 0, max: 99_999_999 }), fc.boolean()), {
          minLength: 1,
          maxLength: 90,
        }),
        fc.integer({ min: 0, max: 10_000 }),
        fc.double({ min: 0.001, max: 99, noNaN: true }),
        (changes, mobilizationCents, rate) => {
          const demo = demoPriceBook();
          const materials = demo.materials.slice(0, changes.length).map((material, index) => {
            const [name, cost, taxable] = changes[index]!;
            // Unit costs with 0–4 decimals.
            const unitCost = String(cost / 10 ** (cost % 5));
            return { ...material, name, unitCost: /e/.test(unitCost) ? '1' : unitCost, taxable };
          });
          const book = priceBookSchema.parse({
            ...demo,
            materials: [
              ...materials,
              ...demo.materials.filter(
                (m) =>
                  ['LINER-EPDM-45', 'UNDERLAY-8OZ', 'GRAVEL-RIVER-MIX'].includes(m.code) &&
                  !materials.some((x) => x.code === m.code),
              ),
            ],
            productionRates: { ...demo.productionRates, gravelLaborHoursPerShortTon: rate },
            settings: { ...demo.settings, mobilizationCost: (mobilizationCents / 100).toFixed(2) },
          } satisfies PriceBook);
          expect(priceBookFromCsv(priceBookToCsv(book))).toEqual({ ok: true, book });
        },
      ),
      { numRuns: 60 },
    );
  });

  it('reports every bad row with its line, column and reason, and returns no book', () => {
    const table = rows(priceBookToCsv(demoPriceBook()));
    // Data row i is on line i + 2 (header = line 1).
    const lineOf = (predicate: (row: Record<string, string>) => boolean) =>
      table.findIndex(predicate) + 2;
    const edit = (
      predicate: (row: Record<string, string>) => boolean,
      change: Record<string, string>,
    ) => {
      const row = table.find(predicate)!;
      Object.assign(row, change);
    };
    const liner = lineOf((row) => row.code === 'LINER-EPDM-45');
    const pipe = lineOf((row) => row.code === 'PIPE-PVC40-2');
    const pump = lineOf((row) => row.code === 'demo-mid-3000');
    const labor = lineOf((row) => row.code === 'INSTALLER');
    const tax = lineOf((row) => row.key === 'salesTaxPct');
    const markup = lineOf((row) => row.key === 'markupPct.materials');
    const gravelRate = lineOf((row) => row.key === 'gravelLaborHoursPerShortTon');
    edit((row) => row.code === 'LINER-EPDM-45', { unitCost: '$0.89' });
    edit((row) => row.code === 'PIPE-PVC40-2', { nominalSizeIn: 'two', taxable: 'maybe' });
    edit((row) => row.code === 'demo-mid-3000', { pumpCurve: '0:19|3000:0:230' });
    edit((row) => row.code === 'INSTALLER', { burdenPct: '128', dailyRate: '10' });
    edit((row) => row.key === 'salesTaxPct', { value: '7,25' });
    edit((row) => row.key === 'markupPct.materials', { value: '' });
    edit((row) => row.key === 'gravelLaborHoursPerShortTon', { value: 'fast' });
    const result = priceBookFromCsv(csvOf(table));
    expect(result.ok).toBe(false);
    if (result.ok) return;
    expect(result.errors).toEqual(
      [
        { line: liner, column: 'unitCost', message: expect.stringContaining('Enter an amount') },
        { line: pipe, column: 'taxable', message: 'Enter yes or no' },
        { line: pipe, column: 'nominalSizeIn', message: 'Enter a number' },
        { line: pump, column: 'pumpCurve', message: expect.stringContaining('flow:head:watts') },
        { line: labor, column: 'dailyRate', message: 'Leave dailyRate empty on a labor row' },
        { line: labor, column: 'burdenPct', message: 'A percentage is at most 100' },
        { line: gravelRate, column: 'value', message: 'Enter a number' },
        { line: tax, column: 'value', message: expect.stringContaining('Enter a percentage') },
        { line: markup, column: 'value', message: expect.stringContaining('markup') },
      ].sort((a, b) => a.line - b.line),
    );
  });

  it('reports unknown sections and keys, codes used twice, dangling references and missing rows', () => {
    const table = rows(priceBookToCsv(demoPriceBook()));
    const lineOf = (predicate: (row: Record<string, string>) => boolean) =>
      table.findIndex(predicate) + 2;
    const underlay = lineOf((row) => row.code === 'UNDERLAY-8OZ');
    const lead = lineOf((row) => row.code === 'LEAD');
    const gravel = lineOf((row) => row.key === 'defaultGravelCode');
    const role = lineOf((row) => row.key === 'taskRole.cleanUp');
    const floor = lineOf((row) => row.key === 'marginFloorPct');
    Object.assign(table[underlay - 2]!, { code: 'liner-epdm-45' }); // used twice, case-insensitively
    Object.assign(table[lead - 2]!, { section: 'crew' });
    Object.assign(table[gravel - 2]!, { value: 'NO-GRAVEL' });
    Object.assign(table[role - 2]!, { value: 'NOBODY' });
    Object.assign(table[floor - 2]!, { key: 'marginFlor' });
    const result = priceBookFromCsv(csvOf(table));
    expect(result.ok).toBe(false);
    if (result.ok) return;
    const found = result.errors.map((error) => [error.line, error.column]);
    expect(found).toEqual(
      expect.arrayContaining([
        [underlay, 'code'],
        [lead, 'section'],
        [gravel, 'value'],
        [role, 'value'],
        [floor, 'key'],
        [0, 'key'], // no marginFloorPct row at all
      ]),
    );
    expect(result.errors.find((error) => error.line === 0)!.message).toBe(
      'The file has no policy row for marginFloorPct',
    );
    // The underlayment default now points at a code no underlayment row has.
    expect(
      result.errors.some(
        (error) => error.column === 'value' && error.message.includes('underlayment'),
      ),
    ).toBe(true);
  });

  it('counts lines as a spreadsheet does when a cell spans lines', () => {
    const book = demoPriceBook();
    book.materials[0] = { ...book.materials[0]!, name: 'Liner\nwith a note' };
    const table = rows(priceBookToCsv(book));
    table[1]!.unitCost = 'abc'; // data row 2 starts on line 4: the first row spans lines 2 and 3
    const result = priceBookFromCsv(csvOf(table));
    expect(result).toEqual({
      ok: false,
      errors: [{ line: 4, column: 'unitCost', message: expect.any(String) }],
    });
  });

  it('refuses an unknown column, an empty file and a row longer than the header', () => {
    expect(priceBookFromCsv('')).toEqual({
      ok: false,
      errors: [expect.objectContaining({ line: 1 })],
    });
    const csv = priceBookToCsv(demoPriceBook());
    const [header, ...rest] = csv.split('\r\n');
    const unknown = priceBookFromCsv([header!.replace('basis', 'basys'), ...rest].join('\r\n'));
    expect(unknown).toEqual({
      ok: false,
      errors: [expect.objectContaining({ line: 1, column: 'basys' })],
    });
    const long = priceBookFromCsv([header, `${rest[0]},extra`, ...rest.slice(1)].join('\r\n'));
    expect(long).toEqual({ ok: false, errors: [expect.objectContaining({ line: 2, column: '' })] });
  });
});
