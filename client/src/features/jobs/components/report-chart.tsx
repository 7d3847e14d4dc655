import '@mantine/charts/styles.css';
import { BarChart } from '@mantine/charts';
import { Paper, Title } from '@mantine/core';
import type { JobCostReport } from '@pondwright/shared';
import { formatMoney } from '@/lib/format';
import { CATEGORY_LABELS } from '@/lib/price-book-labels';

/** Estimated against actual cost by category. Numbers here are only drawn, never summed or stored. */
export function ReportChart({ report }: { report: JobCostReport }) {
  const data = report.categories.map((row) => ({
    category: CATEGORY_LABELS[row.category],
    estimated: Number(row.estimatedCost),
    actual: Number(row.actualCost),
  }));
  return (
    <Paper p="md" withBorder component="figure" m={0} aria-labelledby="report-chart-title">
      <Title order={3} fz="h5" id="report-chart-title" mb="sm">
        Cost by category
      </Title>
      <BarChart
        h={260}
        data={data}
        dataKey="category"
        withLegend
        series={[
          { name: 'estimated', label: 'Estimated', color: 'stone.5' },
          { name: 'actual', label: 'Actual', color: 'reed.6' },
        ]}
        valueFormatter={(value) => formatMoney(String(value), report.currency)}
        tickLine="y"
        xAxisProps={{ interval: 0 }}
      />
    </Paper>
  );
}
