import '@mantine/charts/styles.css';
import { BarChart } from '@mantine/charts';
import { Paper, SimpleGrid, Title } from '@mantine/core';
import { formatMoney } from '@/lib/format';

/** One bar per status; `value` is a number here only to be drawn, never summed or stored. */
export type PipelinePoint = { status: string; count: number; value: number };

type PipelineChartsProps = { data: PipelinePoint[]; currency: string };

export function PipelineCharts({ data, currency }: PipelineChartsProps) {
  return (
    <SimpleGrid cols={{ base: 1, md: 2 }} spacing="lg">
      <Paper p="md" component="figure" m={0} aria-labelledby="pipeline-count-title">
        <Title order={3} fz="h5" id="pipeline-count-title" mb="sm">
          Estimates by status
        </Title>
        <BarChart
          h={240}
          data={data}
          dataKey="status"
          series={[{ name: 'count', label: 'Estimates', color: 'reed.6' }]}
          yAxisProps={{ allowDecimals: false }}
          tickLine="y"
          xAxisProps={{ interval: 0 }}
        />
      </Paper>
      <Paper p="md" component="figure" m={0} aria-labelledby="pipeline-value-title">
        <Title order={3} fz="h5" id="pipeline-value-title" mb="sm">
          Value by status
        </Title>
        <BarChart
          h={240}
          data={data}
          dataKey="status"
          series={[{ name: 'value', label: 'Value', color: 'clay.6' }]}
          valueFormatter={(value) => formatMoney(String(value), currency)}
          tickLine="y"
          xAxisProps={{ interval: 0 }}
        />
      </Paper>
    </SimpleGrid>
  );
}
