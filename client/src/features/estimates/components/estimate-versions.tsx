import { Button, Checkbox, Group, Stack, Table, Text, Title } from '@mantine/core';
import type { EstimateComparison, EstimateVersionSummary } from '@pondwright/shared';
import { useState } from 'react';
import { ErrorPanel } from '@/components/error-panel';
import { formatDate, formatMoney, formatPercent } from '@/lib/format';
import { useEstimateComparison } from '../api/compare-estimate-versions';

const TOTAL_LABELS: Record<string, string> = {
  subtotalCost: 'Subtotal cost',
  subtotalPrice: 'Subtotal price',
  discount: 'Discount',
  tax: 'Sales tax',
  total: 'Total',
  deposit: 'Deposit',
  grossProfit: 'Gross profit',
  grossMarginPct: 'Gross margin %',
};

function ComparisonTable({ comparison }: { comparison: EstimateComparison }) {
  const { a, b } = comparison;
  return (
    <Stack gap="sm">
      <Table aria-label="Totals compared" verticalSpacing={4}>
        <Table.Thead>
          <Table.Tr>
            <Table.Th />
            <Table.Th ta="right">Version {a.versionNumber}</Table.Th>
            <Table.Th ta="right">Version {b.versionNumber}</Table.Th>
            <Table.Th ta="right">Change</Table.Th>
          </Table.Tr>
        </Table.Thead>
        <Table.Tbody>
          <Table.Tr>
            <Table.Th>Total</Table.Th>
            <Table.Td ta="right" ff="monospace">
              {formatMoney(a.total)}
            </Table.Td>
            <Table.Td ta="right" ff="monospace">
              {formatMoney(b.total)}
            </Table.Td>
            <Table.Td />
          </Table.Tr>
          {comparison.totals
            .filter((change) => change.field !== 'total')
            .map((change) => (
              <Table.Tr key={change.field}>
                <Table.Th fw={500}>{TOTAL_LABELS[change.field] ?? change.field}</Table.Th>
                <Table.Td ta="right" ff="monospace">
                  {change.before ?? '—'}
                </Table.Td>
                <Table.Td ta="right" ff="monospace">
                  {change.after ?? '—'}
                </Table.Td>
                <Table.Td ta="right" ff="monospace">
                  {change.delta ?? '—'}
                </Table.Td>
              </Table.Tr>
            ))}
        </Table.Tbody>
      </Table>
      {comparison.lines.length === 0 ? (
        <Text size="sm" c="dimmed">
          The lines are the same in both versions.
        </Text>
      ) : (
        <Table.ScrollContainer minWidth={720}>
          <Table aria-label="Lines compared" verticalSpacing={4}>
            <Table.Thead>
              <Table.Tr>
                <Table.Th>Line</Table.Th>
                <Table.Th ta="right">Qty v{a.versionNumber}</Table.Th>
                <Table.Th ta="right">Price v{a.versionNumber}</Table.Th>
                <Table.Th ta="right">Qty v{b.versionNumber}</Table.Th>
                <Table.Th ta="right">Price v{b.versionNumber}</Table.Th>
                <Table.Th ta="right">Change</Table.Th>
              </Table.Tr>
            </Table.Thead>
            <Table.Tbody>
              {comparison.lines.map((line) => (
                <Table.Tr key={line.id}>
                  <Table.Td>
                    {(line.after ?? line.before)?.description}{' '}
                    <Text span size="xs" c="dimmed">
                      ({line.change})
                    </Text>
                  </Table.Td>
                  <Table.Td ta="right">{line.before?.quantity ?? '—'}</Table.Td>
                  <Table.Td ta="right" ff="monospace">
                    {line.before ? formatMoney(line.before.price) : '—'}
                  </Table.Td>
                  <Table.Td ta="right">{line.after?.quantity ?? '—'}</Table.Td>
                  <Table.Td ta="right" ff="monospace">
                    {line.after ? formatMoney(line.after.price) : '—'}
                  </Table.Td>
                  <Table.Td ta="right" ff="monospace">
                    {line.priceDelta}
                  </Table.Td>
                </Table.Tr>
              ))}
            </Table.Tbody>
          </Table>
        </Table.ScrollContainer>
      )}
    </Stack>
  );
}

/** The finalised versions, and any two of them side by side. */
export function EstimateVersions({
  estimateId,
  versions,
}: {
  estimateId: string;
  versions: EstimateVersionSummary[];
}) {
  const [picked, setPicked] = useState<number[]>([]);
  const [pair, setPair] = useState<{ a: number; b: number } | null>(null);
  const comparison = useEstimateComparison(estimateId, pair);

  if (versions.length === 0) {
    return (
      <Text size="sm" c="dimmed">
        No versions yet. Finalise the draft to freeze it as version 1.
      </Text>
    );
  }
  const toggle = (versionNumber: number, on: boolean) =>
    setPicked((current) =>
      on
        ? [...current.filter((n) => n !== versionNumber), versionNumber].slice(-2)
        : current.filter((n) => n !== versionNumber),
    );
  const sorted = [...picked].sort((x, y) => x - y);

  return (
    <Stack gap="md">
      <Table aria-label="Versions" verticalSpacing={4}>
        <Table.Thead>
          <Table.Tr>
            <Table.Th>Compare</Table.Th>
            <Table.Th>Version</Table.Th>
            <Table.Th ta="right">Total</Table.Th>
            <Table.Th ta="right">Margin</Table.Th>
            <Table.Th>Finalised</Table.Th>
          </Table.Tr>
        </Table.Thead>
        <Table.Tbody>
          {versions.map((version) => (
            <Table.Tr key={version.versionNumber}>
              <Table.Td>
                <Checkbox
                  aria-label={`Compare version ${version.versionNumber}`}
                  checked={picked.includes(version.versionNumber)}
                  onChange={(event) => toggle(version.versionNumber, event.currentTarget.checked)}
                />
              </Table.Td>
              <Table.Td>Version {version.versionNumber}</Table.Td>
              <Table.Td ta="right" ff="monospace">
                {formatMoney(version.total)}
              </Table.Td>
              <Table.Td ta="right">
                {version.grossMarginPct === null ? '—' : formatPercent(version.grossMarginPct)}
              </Table.Td>
              <Table.Td>
                {formatDate(version.finalisedAt)} by {version.finalisedByName}
              </Table.Td>
            </Table.Tr>
          ))}
        </Table.Tbody>
      </Table>
      <Group>
        <Button
          variant="light"
          disabled={sorted.length !== 2}
          onClick={() => sorted.length === 2 && setPair({ a: sorted[0]!, b: sorted[1]! })}
        >
          Compare
        </Button>
        {sorted.length !== 2 && (
          <Text size="sm" c="dimmed">
            Tick two versions to compare them.
          </Text>
        )}
      </Group>
      {pair && (
        <section aria-labelledby="estimate-comparison-title">
          <Title order={3} fz="h5" id="estimate-comparison-title" mb="xs">
            Version {pair.a} and version {pair.b}
          </Title>
          {comparison.isError ? (
            <ErrorPanel title="Could not compare the versions" error={comparison.error} />
          ) : comparison.data ? (
            <ComparisonTable comparison={comparison.data} />
          ) : (
            <Text size="sm" c="dimmed">
              Comparing…
            </Text>
          )}
        </section>
      )}
    </Stack>
  );
}
