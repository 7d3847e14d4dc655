import Papa from 'papaparse';
import type { z } from 'zod';
import { FORMULA_ESCAPED, FORMULA_START } from '../csv/formula-cells';
import { LABOR_TASKS } from '../engine/labor/labor-hours';
import {
  disposalSchema,
  equipmentSchema,
  jobSettingsSchema,
  laborRoleSchema,
  materialSchema,
  PRICE_CATEGORIES,
  priceBookSchema,
  productionRatesSchema,
  type MaterialKind,
  type PriceBook,
  type PumpCurvePoint,
} from './price-book-schema';

/** The sections of a price-book CSV, one per row, in the order `priceBookToCsv` writes them. */
export const CSV_SECTIONS = [
  'material',
  'labor',
  'equipment',
  'disposal',
  'rate',
  'setting',
  'policy',
] as const;
type CsvSection = (typeof CSV_SECTIONS)[number];

const MATERIAL_ATTRIBUTE_COLUMNS = [
  'linerThicknessMil',
  'linerWeightLbPerSqFt',
  'boulderSize',
  'pipeMaterial',
  'nominalSizeIn',
  'fittingKind',
  'ratedFlowGph',
  'pumpCurve',
  'watts',
  'ratingWatts',
  'cableGaugeAwg',
] as const;

/** The columns of a price-book CSV: `section` and the union of every section's columns. */
export const CSV_COLUMNS = [
  'section',
  'code',
  'name',
  'kind',
  'unit',
  'unitCost',
  'taxable',
  ...MATERIAL_ATTRIBUTE_COLUMNS,
  'wagePerHour',
  'burdenPct',
  'use',
  'dailyRate',
  'minimumDays',
  'deliveryFee',
  'widthIn',
  'basis',
  'key',
  'value',
] as const;
type CsvColumn = (typeof CSV_COLUMNS)[number];

/** The columns each section fills; every other column stays empty on its rows. */
const SECTION_COLUMNS: Record<CsvSection, ReadonlyArray<CsvColumn>> = {
  material: ['code', 'name', 'kind', 'unit', 'unitCost', 'taxable', ...MATERIAL_ATTRIBUTE_COLUMNS],
  labor: ['code', 'name', 'wagePerHour', 'burdenPct'],
  equipment: ['code', 'name', 'use', 'dailyRate', 'minimumDays', 'deliveryFee', 'widthIn'],
  disposal: ['code', 'name', 'basis', 'unitCost'],
  rate: ['key', 'value'],
  setting: ['key', 'value'],
  policy: ['key', 'value'],
};

const NUMBER_COLUMNS = new Set<string>([
  'linerThicknessMil',
  'linerWeightLbPerSqFt',
  'nominalSizeIn',
  'ratedFlowGph',
  'watts',
  'ratingWatts',
  'minimumDays',
  'widthIn',
]);

const SETTING_KEYS = [
  'currency',
  'mobilizationCost',
  'minimumJobPrice',
  'contingencyPct',
  'salesTaxPct',
  'depositPct',
  ...LABOR_TASKS.map((task) => `taskRole.${task}`),
  'defaultLinerCode',
  'defaultUnderlaymentCode',
  'defaultGravelCode',
  'defaultDisposalCode',
] as const;
const POLICY_KEYS = [
  ...PRICE_CATEGORIES.map((category) => `markupPct.${category}`),
  'marginFloorPct',
  'discountCeilingPct',
] as const;
const RATE_KEYS = Object.keys(productionRatesSchema.shape) as Array<
  keyof PriceBook['productionRates']
>;
const KEYS: Record<'rate' | 'setting' | 'policy', ReadonlyArray<string>> = {
  rate: RATE_KEYS,
  setting: SETTING_KEYS,
  policy: POLICY_KEYS,
};

/** One problem in a price-book CSV: the line as a spreadsheet shows it (header = 1), the column and why. */
export type CsvError = { line: number; column: string; message: string };

type Row = Partial<Record<CsvColumn, string>>;

function formatPumpCurve(curve: ReadonlyArray<PumpCurvePoint>): string {
  return curve.map((point) => `${point.flowGph}:${point.headFt}:${point.inputWatts}`).join('|');
}

function settingValue(book: PriceBook, key: string): string {
  if (key === 'currency') return book.currency;
  if (key.startsWith('taskRole.')) {
    return book.settings.taskRoles[
      key.slice('taskRole.'.length) as keyof PriceBook['settings']['taskRoles']
    ];
  }
  return String(book.settings[key as Exclude<keyof PriceBook['settings'], 'taskRoles'>]);
}

function policyValue(book: PriceBook, key: string): string {
  if (key.startsWith('markupPct.')) {
    return book.policy.markupPct[
      key.slice('markupPct.'.length) as keyof PriceBook['policy']['markupPct']
    ];
  }
  return book.policy[key as 'marginFloorPct' | 'discountCeilingPct'];
}

/**
 * The whole price book as one CSV (RFC 4180, CRLF line ends): a header of `CSV_COLUMNS`, then one row
 * per material, labor role, equipment and disposal, per production rate (`rate`), job setting
 * (`setting`, including `currency` and `taskRole.<task>`) and policy value (`policy`,
 * `markupPct.<category>`), each row naming its `section`. Material attributes have their own columns;
 * a pump curve is `flow:head:watts` points joined with `|`; `taxable` is yes or no. Money and
 * percentages are written exactly as stored. Cells that a spreadsheet would run as a formula (starting
 * with = + - @) are written with a leading apostrophe, which `priceBookFromCsv` removes again.
 */
export function priceBookToCsv(book: PriceBook): string {
  const rows: Row[] = [];
  for (const material of book.materials) {
    const row: Row = {
      section: 'material',
      code: material.code,
      name: material.name,
      kind: material.kind,
      unit: material.unit,
      unitCost: material.unitCost,
      taxable: material.taxable ? 'yes' : 'no',
    };
    for (const column of MATERIAL_ATTRIBUTE_COLUMNS) {
      const value = material[column];
      if (value === undefined) continue;
      row[column] =
        column === 'pumpCurve' ? formatPumpCurve(value as PumpCurvePoint[]) : String(value);
    }
    rows.push(row);
  }
  for (const role of book.laborRoles) {
    rows.push({
      section: 'labor',
      code: role.code,
      name: role.name,
      wagePerHour: role.wagePerHour,
      burdenPct: role.burdenPct,
    });
  }
  for (const item of book.equipment) {
    rows.push({
      section: 'equipment',
      code: item.code,
      name: item.name,
      use: item.use,
      dailyRate: item.dailyRate,
      minimumDays: String(item.minimumDays),
      deliveryFee: item.deliveryFee,
      widthIn: String(item.widthIn),
    });
  }
  for (const item of book.disposal) {
    rows.push({
      section: 'disposal',
      code: item.code,
      name: item.name,
      basis: item.basis,
      unitCost: item.unitCost,
    });
  }
  for (const key of RATE_KEYS)
    rows.push({ section: 'rate', key, value: String(book.productionRates[key]) });
  for (const key of SETTING_KEYS)
    rows.push({ section: 'setting', key, value: settingValue(book, key) });
  for (const key of POLICY_KEYS)
    rows.push({ section: 'policy', key, value: policyValue(book, key) });
  return Papa.unparse(
    {
      fields: [...CSV_COLUMNS],
      data: rows.map((row) => CSV_COLUMNS.map((column) => row[column] ?? '')),
    },
    { escapeFormulae: FORMULA_START, newline: '\r\n' },
  );
}

type ParsedRow = { cells: string[]; line: number };

/** Rows with the spreadsheet line each starts on (quoted cells may span lines). */
function readRows(text: string): { rows: ParsedRow[]; errors: CsvError[] } {
  const rows: ParsedRow[] = [];
  const errors: CsvError[] = [];
  let start = 0;
  let line = 1;
  Papa.parse<string[]>(text, {
    delimiter: ',',
    skipEmptyLines: false,
    step: (result) => {
      const end = result.meta.cursor;
      for (const error of result.errors) {
        errors.push({ line, column: '', message: `The row cannot be read: ${error.message}` });
      }
      rows.push({ cells: result.data, line });
      for (let i = start; i < end && i < text.length; i++) if (text[i] === '\n') line += 1;
      start = end;
    },
  });
  return { rows, errors };
}

function cell(value: string | undefined): string {
  const trimmed = (value ?? '').trim();
  return FORMULA_ESCAPED.test(trimmed) ? trimmed.slice(1) : trimmed;
}

function parseNumber(text: string): number | undefined {
  return /^[-+]?(\d+\.?\d*|\.\d+)([eE][-+]?\d+)?$/.test(text) ? Number(text) : undefined;
}

function parsePumpCurve(text: string): PumpCurvePoint[] | undefined {
  const points = text.split('|').map((point) =>
    point
      .trim()
      .split(':')
      .map((part) => parseNumber(part.trim())),
  );
  if (points.some((point) => point.length !== 3 || point.some((value) => value === undefined)))
    return undefined;
  return points.map(([flowGph, headFt, inputWatts]) => ({
    flowGph: flowGph!,
    headFt: headFt!,
    inputWatts: inputWatts!,
  }));
}

function parseBoolean(text: string): boolean | undefined {
  const lower = text.toLowerCase();
  if (['yes', 'y', 'true', '1'].includes(lower)) return true;
  if (['no', 'n', 'false', '0'].includes(lower)) return false;
  return undefined;
}

type ItemSection = 'material' | 'labor' | 'equipment' | 'disposal';
const ITEM_SCHEMAS: Record<ItemSection, z.ZodType> = {
  material: materialSchema,
  labor: laborRoleSchema,
  equipment: equipmentSchema,
  disposal: disposalSchema,
};
const BOOK_LISTS = {
  material: 'materials',
  labor: 'laborRoles',
  equipment: 'equipment',
  disposal: 'disposal',
} as const;

/** The schema of one setting, policy or rate value, by its CSV key. */
function keySchema(section: 'rate' | 'setting' | 'policy', key: string): z.ZodType {
  if (section === 'rate')
    return productionRatesSchema.shape[key as keyof PriceBook['productionRates']];
  if (section === 'policy') {
    const policy = priceBookSchema.shape.policy.shape;
    return key.startsWith('markupPct.')
      ? policy.markupPct.shape[
          key.slice('markupPct.'.length) as keyof PriceBook['policy']['markupPct']
        ]
      : policy[key as 'marginFloorPct' | 'discountCeilingPct'];
  }
  if (key === 'currency') return priceBookSchema.shape.currency;
  if (key.startsWith('taskRole.')) {
    return jobSettingsSchema.shape.taskRoles.shape[
      key.slice('taskRole.'.length) as keyof PriceBook['settings']['taskRoles']
    ];
  }
  return jobSettingsSchema.shape[key as Exclude<keyof PriceBook['settings'], 'taskRoles'>];
}

/**
 * Reads a price book written by `priceBookToCsv` (or edited in a spreadsheet). Columns may come in any
 * order and unused ones may be left out; empty lines are skipped; `taxable` takes yes/no/true/false/1/0.
 * Every problem is reported, each with its line as a spreadsheet shows it (header = line 1; line 0 for a
 * row the file lacks altogether, e.g. a missing setting), the column and the reason: unreadable rows,
 * unknown sections, columns or keys, cells filled in columns the section does not use, values the price
 * book schema refuses, codes used twice and references to codes that no row defines. When anything is
 * wrong no book is returned. Export then import gives the same book.
 */
export function priceBookFromCsv(
  text: string,
): { ok: true; book: PriceBook } | { ok: false; errors: CsvError[] } {
  const { rows, errors } = readRows(text.replace(/^\uFEFF/, ''));
  const report = (line: number, column: string, message: string) => {
    if (!errors.some((error) => error.line === line && error.column === column)) {
      errors.push({ line, column, message });
    }
  };
  const done = () => ({ ok: false as const, errors: errors.sort((a, b) => a.line - b.line) });
  const headerRow = rows[0];
  if (!headerRow || headerRow.cells.every((value) => value.trim() === '')) {
    report(1, '', 'The file is empty: the first line must name the columns');
    return done();
  }
  const header = headerRow.cells.map((value) => value.trim());
  header.forEach((name, index) => {
    if (!(CSV_COLUMNS as ReadonlyArray<string>).includes(name)) {
      report(1, name, `Unknown column "${name}"; the columns are ${CSV_COLUMNS.join(', ')}`);
    } else if (header.indexOf(name) !== index) {
      report(1, name, `The column "${name}" appears twice`);
    }
  });
  if (!header.includes('section')) report(1, 'section', 'The header needs a "section" column');
  if (errors.length > 0) return done();

  const items: Record<ItemSection, Array<{ line: number; value: Record<string, unknown> }>> = {
    material: [],
    labor: [],
    equipment: [],
    disposal: [],
  };
  const keyed: Record<
    'rate' | 'setting' | 'policy',
    Map<string, { line: number; value: unknown }>
  > = {
    rate: new Map(),
    setting: new Map(),
    policy: new Map(),
  };

  for (const { cells, line } of rows.slice(1)) {
    if (cells.every((value) => value.trim() === '')) continue;
    if (cells.slice(header.length).some((value) => value.trim() !== '')) {
      report(line, '', `This row has more cells than the header has columns (${header.length})`);
    }
    const row: Row = {};
    header.forEach((name, index) => {
      const value = cell(cells[index]);
      if (value !== '') row[name as CsvColumn] = value;
    });
    const section = row.section as CsvSection | undefined;
    if (section === undefined || !(CSV_SECTIONS as ReadonlyArray<string>).includes(section)) {
      report(line, 'section', `Use one of these sections: ${CSV_SECTIONS.join(', ')}`);
      continue;
    }
    const allowed = SECTION_COLUMNS[section];
    for (const column of Object.keys(row) as CsvColumn[]) {
      if (column !== 'section' && !allowed.includes(column)) {
        report(line, column, `Leave ${column} empty on a ${section} row`);
      }
    }

    if (section === 'rate' || section === 'setting' || section === 'policy') {
      const key = row.key ?? '';
      if (!KEYS[section].includes(key)) {
        report(
          line,
          'key',
          key === ''
            ? 'Fill in the key'
            : `Unknown ${section} "${key}"; use one of ${KEYS[section].join(', ')}`,
        );
        continue;
      }
      const seen = keyed[section].get(key);
      if (seen) {
        report(line, 'key', `The ${section} ${key} is already set on line ${seen.line}`);
        continue;
      }
      const raw = row.value ?? '';
      const value = section === 'rate' ? parseNumber(raw) : raw;
      if (section === 'rate' && value === undefined) {
        report(line, 'value', raw === '' ? 'Fill in the value' : 'Enter a number');
      } else {
        const result = keySchema(section, key).safeParse(value);
        if (!result.success) report(line, 'value', result.error.issues[0]?.message ?? 'Not valid');
      }
      keyed[section].set(key, { line, value });
      continue;
    }

    const value: Record<string, unknown> = {};
    for (const column of allowed) {
      const raw = row[column];
      if (raw === undefined) continue;
      if (NUMBER_COLUMNS.has(column)) {
        const number = parseNumber(raw);
        if (number === undefined) report(line, column, 'Enter a number');
        else value[column] = number;
      } else if (column === 'taxable') {
        const flag = parseBoolean(raw);
        if (flag === undefined) report(line, column, 'Enter yes or no');
        else value[column] = flag;
      } else if (column === 'pumpCurve') {
        const curve = parsePumpCurve(raw);
        if (curve === undefined) {
          report(
            line,
            column,
            'Write the curve as flow:head:watts points joined by |, e.g. 0:14:165|2000:0:150',
          );
        } else value[column] = curve;
      } else value[column] = raw;
    }
    const result = ITEM_SCHEMAS[section].safeParse(value);
    if (!result.success) {
      for (const issue of result.error.issues) {
        const column = String(issue.path[0] ?? 'code');
        report(
          line,
          column,
          row[column as CsvColumn] === undefined && issue.code === 'invalid_type'
            ? `Fill in ${column} for a ${section} row`
            : issue.message,
        );
      }
    }
    items[section].push({
      line,
      value: result.success ? (result.data as Record<string, unknown>) : value,
    });
  }

  // Rows the book needs but the file lacks.
  for (const section of ['rate', 'setting', 'policy'] as const) {
    for (const key of KEYS[section]) {
      if (!keyed[section].has(key)) report(0, 'key', `The file has no ${section} row for ${key}`);
    }
  }
  if (items.labor.length === 0) report(0, 'section', 'Add at least one labor row');
  if (items.disposal.length === 0) report(0, 'section', 'Add at least one disposal row');

  // Codes used twice, and codes the settings refer to.
  for (const section of ['material', 'labor', 'equipment', 'disposal'] as const) {
    const first = new Map<string, number>();
    for (const { line, value } of items[section]) {
      const code = typeof value.code === 'string' ? value.code.toLowerCase() : undefined;
      if (code === undefined) continue;
      const seen = first.get(code);
      if (seen !== undefined) report(line, 'code', `This code is already used on line ${seen}`);
      else first.set(code, line);
    }
  }
  const references: Array<[string, MaterialKind | 'labor' | 'disposal']> = [
    ['defaultLinerCode', 'liner'],
    ['defaultUnderlaymentCode', 'underlayment'],
    ['defaultGravelCode', 'gravel'],
    ['defaultDisposalCode', 'disposal'],
    ...LABOR_TASKS.map((task): [string, 'labor'] => [`taskRole.${task}`, 'labor']),
  ];
  for (const [key, target] of references) {
    const setting = keyed.setting.get(key);
    if (!setting || typeof setting.value !== 'string' || setting.value === '') continue;
    const found =
      target === 'labor'
        ? items.labor.some((item) => item.value.code === setting.value)
        : target === 'disposal'
          ? items.disposal.some((item) => item.value.code === setting.value)
          : items.material.some(
              (item) => item.value.code === setting.value && item.value.kind === target,
            );
    if (!found) {
      report(
        setting.line,
        'value',
        `No ${target === 'labor' ? 'labor role' : target} row has the code ${setting.value}`,
      );
    }
  }
  if (errors.length > 0) return done();

  const setting = (key: string) => keyed.setting.get(key)!.value;
  const candidate = {
    currency: setting('currency'),
    materials: items.material.map((item) => item.value),
    laborRoles: items.labor.map((item) => item.value),
    equipment: items.equipment.map((item) => item.value),
    disposal: items.disposal.map((item) => item.value),
    productionRates: Object.fromEntries(RATE_KEYS.map((key) => [key, keyed.rate.get(key)!.value])),
    settings: {
      ...Object.fromEntries(
        SETTING_KEYS.filter((key) => key !== 'currency' && !key.startsWith('taskRole.')).map(
          (key) => [key, setting(key)],
        ),
      ),
      taskRoles: Object.fromEntries(LABOR_TASKS.map((task) => [task, setting(`taskRole.${task}`)])),
    },
    policy: {
      markupPct: Object.fromEntries(
        PRICE_CATEGORIES.map((category) => [
          category,
          keyed.policy.get(`markupPct.${category}`)!.value,
        ]),
      ),
      marginFloorPct: keyed.policy.get('marginFloorPct')!.value,
      discountCeilingPct: keyed.policy.get('discountCeilingPct')!.value,
    },
  };
  const parsed = priceBookSchema.safeParse(candidate);
  if (parsed.success) return { ok: true, book: parsed.data };
  // A safety net: the checks above should already have caught everything the schema refuses.
  for (const issue of parsed.error.issues) {
    const [first, second, third] = issue.path.map(String);
    const list = Object.entries(BOOK_LISTS).find(([, name]) => name === first)?.[0] as
      ItemSection | undefined;
    if (list) {
      report(items[list][Number(second)]?.line ?? 0, third ?? 'code', issue.message);
    } else if (first === 'settings') {
      const key = second === 'taskRoles' ? `taskRole.${third}` : second!;
      report(keyed.setting.get(key)?.line ?? 0, 'value', issue.message);
    } else if (first === 'policy') {
      const key = second === 'markupPct' ? `markupPct.${third}` : second!;
      report(keyed.policy.get(key)?.line ?? 0, 'value', issue.message);
    } else if (first === 'productionRates') {
      report(keyed.rate.get(second!)?.line ?? 0, 'value', issue.message);
    } else {
      report(keyed.setting.get('currency')?.line ?? 0, 'value', issue.message);
    }
  }
  return done();
}
