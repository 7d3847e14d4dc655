import { Text } from '@mantine/core';
import type { JobCostReport } from '@pondwright/shared';
import { Item, Spent, type Money } from './report-cells';
import { ReportTable, type ReportColumn } from './report-table';

type Report = JobCostReport;

export function MaterialsTable({ report, money }: { report: Report; money: Money }) {
  const columns: ReportColumn<Report['materials'][number]>[] = [
    { header: 'Material', cell: (row) => <Item row={row} /> },
    { header: 'Unit', cell: (row) => row.unit },
    { header: 'Estimated', figure: true, cell: (row) => row.estimatedQuantity },
    { header: 'Delivered', figure: true, cell: (row) => row.deliveredQuantity },
    { header: 'Used', figure: true, cell: (row) => row.usedQuantity },
    { header: 'Returned', figure: true, cell: (row) => row.returnedQuantity },
    { header: 'On hand', figure: true, cell: (row) => row.onHandQuantity },
    { header: 'Estimated cost', figure: true, cell: (row) => money(row.estimatedCost) },
    {
      header: 'Actual cost',
      figure: true,
      cell: (row) => <Spent estimated={row.estimatedCost} actual={row.actualCost} money={money} />,
    },
  ];
  return (
    <ReportTable
      title="Materials"
      rows={report.materials}
      columns={columns}
      rowKey={(row) => row.key}
      empty="No materials in the budget or the logs."
      minWidth={900}
    />
  );
}

/** Disposal logged in loads shows in the budget's yd³, with the loads the crew counted beneath. */
function ActualQuantity({ row }: { row: Report['equipment'][number] }) {
  if (row.loggedLoads === null) return row.actualQuantity;
  return (
    <>
      {row.actualQuantity}
      <Text component="span" display="block" size="xs" c="dimmed">
        from {row.loggedLoads} {row.loggedLoads === '1' ? 'load' : 'loads'}
      </Text>
    </>
  );
}

/** Equipment and disposal share a shape: estimated and actual quantity in the budget line's unit. */
export function QuantityTable({
  title,
  rows,
  money,
  empty,
}: {
  title: string;
  rows: Report['equipment'];
  money: Money;
  empty: string;
}) {
  const columns: ReportColumn<Report['equipment'][number]>[] = [
    { header: 'Item', cell: (row) => <Item row={row} /> },
    { header: 'Unit', cell: (row) => row.unit },
    { header: 'Estimated', figure: true, cell: (row) => row.estimatedQuantity },
    { header: 'Actual', figure: true, cell: (row) => <ActualQuantity row={row} /> },
    { header: 'Estimated cost', figure: true, cell: (row) => money(row.estimatedCost) },
    {
      header: 'Actual cost',
      figure: true,
      cell: (row) => <Spent estimated={row.estimatedCost} actual={row.actualCost} money={money} />,
    },
  ];
  return (
    <ReportTable
      title={title}
      rows={rows}
      columns={columns}
      rowKey={(row) => row.key}
      empty={empty}
    />
  );
}

/** Mobilization, contingency and other allowances: money only, no quantities to log. */
export function OtherCostsTable({ report, money }: { report: Report; money: Money }) {
  const columns: ReportColumn<Report['other'][number]>[] = [
    { header: 'Item', cell: (row) => row.description },
    { header: 'Estimated cost', figure: true, cell: (row) => money(row.estimatedCost) },
    {
      header: 'Actual cost',
      figure: true,
      cell: (row) => <Spent estimated={row.estimatedCost} actual={row.actualCost} money={money} />,
    },
  ];
  return (
    <ReportTable
      title="Other costs"
      rows={report.other}
      columns={columns}
      rowKey={(row) => row.key}
      empty="No other costs in the budget."
      minWidth={480}
    />
  );
}
