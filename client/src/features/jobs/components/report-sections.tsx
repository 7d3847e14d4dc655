import { Text } from '@mantine/core';
import type { JobCostReport } from '@pondwright/shared';
import { formatPercent } from '@/lib/format';
import { CATEGORY_LABELS } from '@/lib/price-book-labels';
import { formatDay } from '../utils/week';
import { Spent, type Money } from './report-cells';
import { ReportTable, type ReportColumn } from './report-table';

type Report = JobCostReport;

export function CategoriesTable({ report, money }: { report: Report; money: Money }) {
  const columns: ReportColumn<Report['categories'][number]>[] = [
    { header: 'Category', cell: (row) => CATEGORY_LABELS[row.category] },
    { header: 'Estimated', figure: true, cell: (row) => money(row.estimatedCost) },
    {
      header: 'Actual',
      figure: true,
      cell: (row) => <Spent estimated={row.estimatedCost} actual={row.actualCost} money={money} />,
    },
    { header: 'Variance', figure: true, cell: (row) => money(row.variance) },
    { header: 'Variance %', figure: true, cell: (row) => formatPercent(row.variancePct) || '—' },
  ];
  return (
    <ReportTable
      title="By category"
      rows={report.categories}
      columns={columns}
      rowKey={(row) => row.category}
      empty="No costs yet."
      minWidth={560}
    />
  );
}

export function LaborTable({ report, money }: { report: Report; money: Money }) {
  const columns: ReportColumn<Report['labor'][number]>[] = [
    { header: 'Task', cell: (row) => row.label },
    { header: 'Estimated hours', figure: true, cell: (row) => row.estimatedHours },
    { header: 'Actual hours', figure: true, cell: (row) => row.actualHours },
    { header: 'Estimated cost', figure: true, cell: (row) => money(row.estimatedCost) },
    {
      header: 'Actual cost',
      figure: true,
      cell: (row) => <Spent estimated={row.estimatedCost} actual={row.actualCost} money={money} />,
    },
  ];
  return (
    <ReportTable
      title="Labor"
      rows={report.labor}
      columns={columns}
      rowKey={(row, index) => `${row.task ?? 'none'}-${index}`}
      empty="No labor in the budget or the logs."
    />
  );
}

export function PeopleTable({ report }: { report: Report }) {
  const columns: ReportColumn<Report['people'][number]>[] = [
    { header: 'Person', cell: (row) => row.person },
    { header: 'Hours', figure: true, cell: (row) => row.hours },
    { header: 'Days worked', figure: true, cell: (row) => row.daysWorked },
  ];
  return (
    <ReportTable
      title="Hours by person"
      rows={report.people}
      columns={columns}
      rowKey={(row) => row.person}
      empty="Nobody has logged hours yet."
      minWidth={360}
    />
  );
}

export function ScheduleDaysTable({ report }: { report: Report }) {
  const { schedule } = report;
  const over = Number(schedule.actualCrewDays) > Number(schedule.plannedCrewDays);
  const columns: ReportColumn<Report['schedule']>[] = [
    { header: 'Planned crew days', figure: true, cell: (row) => row.plannedCrewDays },
    {
      header: 'Actual crew days',
      figure: true,
      cell: (row) => (
        <Text span inherit c={over ? 'red.7' : undefined}>
          {row.actualCrewDays}
        </Text>
      ),
    },
    { header: 'First day on site', cell: (row) => formatDay(row.firstWorkedDate) || '—' },
    { header: 'Last day on site', cell: (row) => formatDay(row.lastWorkedDate) || '—' },
  ];
  return (
    <ReportTable
      title="Schedule"
      rows={[schedule]}
      columns={columns}
      rowKey={() => 'schedule'}
      empty=""
      minWidth={560}
    />
  );
}
