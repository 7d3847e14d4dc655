import { Paper, SimpleGrid, Stack, Text } from '@mantine/core';
import type { JobCostReport } from '@pondwright/shared';
import { formatMoney, formatPercent } from '@/lib/format';

function Figure({ label, value, color }: { label: string; value: string; color?: string }) {
  return (
    <Stack gap={0}>
      <Text size="xs" c="dimmed">
        {label}
      </Text>
      <Text fw={700} fz="lg" ff="monospace" c={color} aria-label={label}>
        {value || '—'}
      </Text>
    </Stack>
  );
}

/** True when the job kept less of the price than the quote planned; only a colour depends on it. */
function realisedBelowQuoted(totals: JobCostReport['totals']): boolean {
  if (totals.actualMarginPct === null || totals.quotedMarginPct === null) return false;
  return Number(totals.actualMarginPct) < Number(totals.quotedMarginPct);
}

/** What the job was sold for, what it cost, and the margin quoted against the margin realised. */
export function ReportTotals({ report }: { report: JobCostReport }) {
  const { totals, currency } = report;
  const money = (amount: string) => formatMoney(amount, currency);
  const below = realisedBelowQuoted(totals);
  const marginColor = totals.actualMarginPct === null ? undefined : below ? 'red.7' : 'reed.7';

  return (
    <Paper p="md" withBorder component="section" aria-label="Totals">
      <SimpleGrid cols={{ base: 2, sm: 4 }} spacing="md">
        <Figure label="Sold for (before tax)" value={money(totals.quotedPriceBeforeTax)} />
        <Figure label="Estimated cost" value={money(totals.estimatedCost)} />
        <Figure label="Actual cost" value={money(totals.actualCost)} />
        <span />
        <Figure label="Quoted gross profit" value={money(totals.quotedGrossProfit)} />
        <Figure
          label="Realised gross profit"
          value={money(totals.actualGrossProfit)}
          color={marginColor}
        />
        <Figure label="Quoted margin" value={formatPercent(totals.quotedMarginPct)} />
        <Figure
          label="Realised margin"
          value={formatPercent(totals.actualMarginPct)}
          color={marginColor}
        />
      </SimpleGrid>
      {below && (
        <Text size="sm" c="red.7" mt="sm">
          The job kept less of the price than the quote planned.
        </Text>
      )}
    </Paper>
  );
}
