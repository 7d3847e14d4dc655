import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import { jobCostReport } from './job-cost-report';
import { JOB_REPORT_CSV_COLUMNS, jobReportCsv } from './job-report-csv';
import { fixtureBudget, fixtureLogs, quantityEntry } from './testing/job-fixtures';

const reportOf = (logs = fixtureLogs()) =>
  jobCostReport({
    budget: fixtureBudget(),
    logs,
    plannedStart: '2025-05-12',
    plannedCrewDays: '3.0',
  });

function table(csv: string): Array<Record<string, string>> {
  return Papa.parse<Record<string, string>>(csv, { header: true, skipEmptyLines: true }).data;
}

describe('jobReportCsv', () => {
  it('writes a header, one row per line, the categories and the total, with CRLF line ends', () => {
    const csv = jobReportCsv(reportOf(), { currency: 'USD' });
    const lines = csv.split('\r\n');
    expect(lines[0]).toBe(
      'section,item,unit,estimated quantity,actual quantity,delivered,used,returned,estimated cost,actual cost,variance',
    );
    expect(lines[0]).toBe(JOB_REPORT_CSV_COLUMNS.join(','));
    expect(csv.replace(/\r\n/g, '')).not.toContain('\n');
    // 5 labor tasks, 6 materials, 2 equipment, 1 disposal, 2 other, 5 categories, 1 total
    expect(table(csv).map((row) => row.section)).toEqual([
      ...Array(5).fill('labor'),
      ...Array(6).fill('material'),
      'equipment',
      'equipment',
      'disposal',
      'other',
      'other',
      ...Array(5).fill('category'),
      'total',
    ]);
    // rockPlacing: 13.8 h quoted, 17.5 h logged; 565.25 → 716.80
    expect(lines[2]).toBe('labor,Boulder and gravel placing,h,13.8,17.5,,,,565.25,716.80,151.55');
    // liner: 560 estimated; 600 delivered − 40 returned = 560 bought; 476.00 against 498.40
    expect(lines).toContain(
      'material,"EPDM liner, 45 mil",sq ft,560,560,600,560,40,498.40,476.00,-22.40',
    );
    expect(lines).toContain(
      'other,"Contingency, 5 % of direct cost 3749.50",,,,,,,187.48,0.00,-187.48',
    );
    expect(lines).toContain('category,other,USD,,,,,,537.48,350.00,-187.48');
    expect(lines.at(-1)).toBe('total,Total,USD,,,,,,4286.98,4630.18,343.20');
  });

  it('quotes commas, quotes and line breaks, and guards cells a spreadsheet would run', () => {
    const logs = [
      {
        logDate: '2025-05-12',
        entries: [
          quantityEntry(
            'material',
            'delivered',
            null,
            '=HYPERLINK("http://x.test","pay")',
            '1',
            'each',
            '5.00',
          ),
          quantityEntry(
            'material',
            'delivered',
            null,
            'Foam, "black"\nsecond line',
            '1',
            'each',
            '5.00',
          ),
          quantityEntry('material', 'delivered', null, '-5 mm pebbles', '1', '@bag', '5.00'),
          quantityEntry('material', 'delivered', null, '+1 spare', '1', 'each', '5.00'),
        ],
      },
    ];
    const csv = jobReportCsv(reportOf(logs), { currency: 'USD' });
    expect(csv).toContain(
      `material,"'=HYPERLINK(""http://x.test"",""pay"")",each,0,1,1,0,0,0.00,5.00,5.00\r\n`,
    );
    expect(csv).toContain(
      `material,"Foam, ""black""\nsecond line",each,0,1,1,0,0,0.00,5.00,5.00\r\n`,
    );
    expect(csv).toContain(`material,'-5 mm pebbles,'@bag,0,1,1,0,0,0.00,5.00,5.00\r\n`);
    expect(csv).toContain(`material,'+1 spare,each,`);
    // Negative numbers in number columns stay numbers.
    expect(csv).toContain(',570.00,0.00,-570.00\r\n');
    expect(csv).not.toContain("'-570");
    // A spreadsheet reading the file gets the text back with the guard apostrophe.
    const rows = table(csv);
    expect(rows.map((row) => row.item)).toContain('Foam, "black"\nsecond line');
    expect(rows.map((row) => row.item)).toContain(`'=HYPERLINK("http://x.test","pay")`);
  });

  it('refuses a currency that is not the report’s', () => {
    expect(() => jobReportCsv(reportOf(), { currency: 'CAD' })).toThrow(
      'The report is in USD, not CAD',
    );
  });
});
