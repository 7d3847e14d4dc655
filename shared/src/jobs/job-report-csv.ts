import Papa from 'papaparse';
import { guardFormula } from '../csv/formula-cells';
import type { JobCostReport } from './job-cost-report';

/** The columns of the job cost report CSV, in order. */
export const JOB_REPORT_CSV_COLUMNS = [
  'section',
  'item',
  'unit',
  'estimated quantity',
  'actual quantity',
  'delivered',
  'used',
  'returned',
  'estimated cost',
  'actual cost',
  'variance',
] as const;

/** The columns after `unit` hold numbers only. */
const FIRST_NUMBER_COLUMN = JOB_REPORT_CSV_COLUMNS.indexOf('estimated quantity');
const PLAIN_NUMBER = /^-?\d+(\.\d+)?$/;

type Cells = [
  section: string,
  item: string,
  unit: string,
  estimatedQuantity: string,
  actualQuantity: string,
  delivered: string,
  used: string,
  returned: string,
  estimatedCost: string,
  actualCost: string,
  variance: string,
];

/** A cell as written: a plain number in a number column as it is, anything else guarded. */
function cell(value: string, column: number): string {
  return column >= FIRST_NUMBER_COLUMN && PLAIN_NUMBER.test(value) ? value : guardFormula(value);
}

/**
 * The job cost report as CSV (RFC 4180: CRLF line ends; cells with commas, quotes or line breaks
 * quoted, quotes doubled). A header of `JOB_REPORT_CSV_COLUMNS`, then one row per labor task
 * (`labor`, unit h), material (`material`: actual quantity = delivered − returned), equipment,
 * disposal and other line (`other`: costs only), then one row per category (`category`) and a
 * `total` row; category and total rows carry the currency in the unit column. Quantities and money
 * are written as in the report (plain decimals, money with 2 decimals, no currency sign). Text cells a
 * spreadsheet would run as a formula (starting with = + - @, tab or carriage return) get a leading
 * apostrophe (OWASP); plain numbers in number columns, negative variances included, are left alone.
 * Throws when `currency` is not the report's.
 */
export function jobReportCsv(report: JobCostReport, options: { currency: string }): string {
  if (options.currency !== report.currency) {
    throw new RangeError(`The report is in ${report.currency}, not ${options.currency}`);
  }
  const rows: Cells[] = [];
  for (const row of report.labor) {
    rows.push([
      'labor',
      row.label,
      'h',
      row.estimatedHours,
      row.actualHours,
      '',
      '',
      '',
      row.estimatedCost,
      row.actualCost,
      row.variance,
    ]);
  }
  for (const row of report.materials) {
    rows.push([
      'material',
      row.description,
      row.unit,
      row.estimatedQuantity,
      row.actualQuantity,
      row.deliveredQuantity,
      row.usedQuantity,
      row.returnedQuantity,
      row.estimatedCost,
      row.actualCost,
      row.variance,
    ]);
  }
  for (const [section, list] of [
    ['equipment', report.equipment],
    ['disposal', report.disposal],
  ] as const) {
    for (const row of list) {
      rows.push([
        section,
        row.description,
        row.unit,
        row.estimatedQuantity,
        row.actualQuantity,
        '',
        '',
        '',
        row.estimatedCost,
        row.actualCost,
        row.variance,
      ]);
    }
  }
  for (const row of report.other) {
    rows.push([
      'other',
      row.description,
      '',
      '',
      '',
      '',
      '',
      '',
      row.estimatedCost,
      row.actualCost,
      row.variance,
    ]);
  }
  for (const row of report.categories) {
    rows.push([
      'category',
      row.category,
      report.currency,
      '',
      '',
      '',
      '',
      '',
      row.estimatedCost,
      row.actualCost,
      row.variance,
    ]);
  }
  const totals = report.totals;
  rows.push([
    'total',
    'Total',
    report.currency,
    '',
    '',
    '',
    '',
    '',
    totals.estimatedCost,
    totals.actualCost,
    totals.variance,
  ]);
  return Papa.unparse(
    {
      fields: [...JOB_REPORT_CSV_COLUMNS],
      data: rows.map((cells) => cells.map(cell)),
    },
    { newline: '\r\n', escapeFormulae: false },
  );
}
