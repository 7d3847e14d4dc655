import { EmptyState, Loader, Paper, SimpleGrid, Skeleton, Stack, Text, Title } from '@mantine/core';
import { IconChartBar } from '@tabler/icons-react';
import { lazy, Suspense } from 'react';
import { ErrorPanel } from '@/components/error-panel';
import { formatPercent } from '@/lib/format';
import { useEstimateStats, type EstimateStats } from '../api/get-estimate-stats';
import { STATUS_LABELS } from './status-labels';

// Recharts is large; it loads after the figures, only for owners who see the dashboard.
const PipelineCharts = lazy(async () => ({
  default: (await import('./pipeline-charts')).PipelineCharts,
}));

type StatCardProps = { label: string; value: string | null; hint: string; empty: string };

function StatCard({ label, value, hint, empty }: StatCardProps) {
  return (
    <Paper p="md">
      <Text size="xs" c="dimmed" tt="uppercase" fw={700}>
        {label}
      </Text>
      <Text fz="h2" fw={700} aria-label={label}>
        {value === null ? '—' : formatPercent(value)}
      </Text>
      <Text size="xs" c="dimmed">
        {value === null ? empty : hint}
      </Text>
    </Paper>
  );
}

function chartData(stats: EstimateStats) {
  return stats.byStatus.map((row) => ({
    status: STATUS_LABELS[row.status],
    count: row.count,
    value: Number(row.value),
  }));
}

/** The owner's pipeline: counts and value by status, win rate and average margin. */
export function OwnerDashboard() {
  const stats = useEstimateStats();

  let body;
  if (stats.isPending) {
    body = <Skeleton h={120} aria-label="Loading the pipeline" />;
  } else if (stats.isError) {
    body = (
      <ErrorPanel
        title="Could not load the pipeline"
        error={stats.error}
        onRetry={() => stats.refetch()}
      />
    );
  } else if (stats.data.byStatus.every((row) => row.count === 0)) {
    body = (
      <EmptyState
        size="sm"
        icon={<IconChartBar />}
        title="No estimates yet"
        description="Counts, value, win rate and margin appear here once estimates are written."
      />
    );
  } else {
    const currency = stats.data.currency ?? 'USD';
    const open = stats.data.byStatus
      .filter((row) => ['awaiting_approval', 'approved', 'sent', 'viewed'].includes(row.status))
      .reduce((sum, row) => sum + row.count, 0);
    body = (
      <Stack gap="lg">
        <SimpleGrid cols={{ base: 1, sm: 3 }} spacing="lg">
          <StatCard
            label="Win rate"
            value={stats.data.winRatePct}
            hint="Accepted out of accepted and declined"
            empty="Nothing accepted or declined yet"
          />
          <StatCard
            label="Average margin"
            value={stats.data.averageMarginPct}
            hint="Gross margin of each estimate's latest version"
            empty="No estimate finalised yet"
          />
          <Paper p="md">
            <Text size="xs" c="dimmed" tt="uppercase" fw={700}>
              Open estimates
            </Text>
            <Text fz="h2" fw={700}>
              {open}
            </Text>
            <Text size="xs" c="dimmed">
              Finalised and not yet accepted, declined or expired
            </Text>
          </Paper>
        </SimpleGrid>
        <Suspense fallback={<Loader size="sm" aria-label="Loading the charts" />}>
          <PipelineCharts data={chartData(stats.data)} currency={currency} />
        </Suspense>
        <Text size="xs" c="dimmed">
          Value is each estimate&apos;s latest version total, or its draft&apos;s before it has one,
          in {currency}.
        </Text>
      </Stack>
    );
  }

  return (
    <section aria-labelledby="pipeline-title">
      <Title order={2} fz="h4" id="pipeline-title" mb="sm">
        Pipeline
      </Title>
      {body}
    </section>
  );
}
