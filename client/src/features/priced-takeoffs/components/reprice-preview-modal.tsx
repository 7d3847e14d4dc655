import { Badge, Button, Group, Modal, Stack, Table, Text, Title } from '@mantine/core';
import type { PricedLineChange } from '@pondwright/shared/pricing';
import { IconRefresh } from '@tabler/icons-react';
import { ErrorPanel } from '@/components/error-panel';
import { PriceBookChangesTable } from '@/components/price-book-changes-table';
import { TableSkeleton } from '@/components/table-skeleton';
import { formatMoney } from '@/lib/format';
import { useRepricePreview } from '../api/get-reprice-preview';

const TOTAL_LABELS: Record<string, string> = {
  subtotalCost: 'Cost',
  subtotalPrice: 'Subtotal',
  discount: 'Discount',
  minimumJobCharge: 'Minimum job charge',
  taxableAmount: 'Taxable amount',
  tax: 'Sales tax',
  total: 'Total',
  deposit: 'Deposit',
  grossProfit: 'Gross profit',
  grossMarginPct: 'Gross margin %',
};

const CHANGE_LABELS: Record<PricedLineChange['change'], string> = {
  added: 'New line',
  removed: 'Line removed',
  changed: 'Changed',
};

function signed(amount: string | null): string {
  if (amount === null) return '—';
  return amount.startsWith('-') ? `−${formatMoney(amount.slice(1))}` : `+${formatMoney(amount)}`;
}

type RepricePreviewModalProps = {
  id: string;
  opened: boolean;
  repricing: boolean;
  onReprice: () => void;
  onClose: () => void;
};

/** What pricing again with the latest book would change, before anything is saved. */
export function RepricePreviewModal({
  id,
  opened,
  repricing,
  onReprice,
  onClose,
}: RepricePreviewModalProps) {
  const preview = useRepricePreview(id, opened);
  const data = preview.data;

  return (
    <Modal opened={opened} onClose={onClose} title="What re-pricing would change" size="xl">
      {preview.isError ? (
        <ErrorPanel
          title="Could not work out the changes"
          error={preview.error}
          onRetry={() => void preview.refetch()}
        />
      ) : !data ? (
        <TableSkeleton label="Working out the changes" />
      ) : (
        <Stack gap="md">
          <Text size="sm">
            {data.upToDate
              ? `Priced with version ${data.currentVersion.versionNumber}, the book in effect today: re-pricing would change nothing.`
              : `Priced with version ${data.currentVersion.versionNumber}; the book in effect today is version ${data.latestVersion.versionNumber}.`}
          </Text>
          <Group gap="xl">
            <Text size="sm">
              Total now <b>{formatMoney(data.currentTotal)}</b>
            </Text>
            <Text size="sm">
              Total after re-pricing <b>{formatMoney(data.newTotal)}</b>
            </Text>
          </Group>
          <section aria-labelledby="book-changes-title">
            <Title order={3} fz="h6" id="book-changes-title" mb={4}>
              Price-book changes since then
            </Title>
            {data.bookChanges.length === 0 ? (
              <Text size="sm" c="dimmed">
                None.
              </Text>
            ) : (
              <PriceBookChangesTable changes={data.bookChanges} label="Price-book changes" />
            )}
          </section>
          <section aria-labelledby="line-changes-title">
            <Title order={3} fz="h6" id="line-changes-title" mb={4}>
              Lines that would change
            </Title>
            {data.estimateChanges.lines.length === 0 ? (
              <Text size="sm" c="dimmed">
                None.
              </Text>
            ) : (
              <Table.ScrollContainer minWidth={560}>
                <Table aria-label="Line changes" verticalSpacing={4}>
                  <Table.Thead>
                    <Table.Tr>
                      <Table.Th>Line</Table.Th>
                      <Table.Th ta="right">Price before</Table.Th>
                      <Table.Th ta="right">Price after</Table.Th>
                      <Table.Th ta="right">Difference</Table.Th>
                    </Table.Tr>
                  </Table.Thead>
                  <Table.Tbody>
                    {data.estimateChanges.lines.map((line) => (
                      <Table.Tr key={line.id}>
                        <Table.Td>
                          {(line.after ?? line.before)?.description}
                          {line.change !== 'changed' && (
                            <Badge size="xs" variant="light" color="clay" ml={6}>
                              {CHANGE_LABELS[line.change]}
                            </Badge>
                          )}
                        </Table.Td>
                        <Table.Td ta="right" c="dimmed">
                          {line.before ? formatMoney(line.before.price) : '—'}
                        </Table.Td>
                        <Table.Td ta="right">
                          {line.after ? formatMoney(line.after.price) : '—'}
                        </Table.Td>
                        <Table.Td ta="right" ff="monospace">
                          {signed(line.priceDelta)}
                        </Table.Td>
                      </Table.Tr>
                    ))}
                  </Table.Tbody>
                </Table>
              </Table.ScrollContainer>
            )}
          </section>
          {data.estimateChanges.totals.length > 0 && (
            <section aria-labelledby="total-changes-title">
              <Title order={3} fz="h6" id="total-changes-title" mb={4}>
                Totals that would change
              </Title>
              <Table aria-label="Total changes" verticalSpacing={4}>
                <Table.Tbody>
                  {data.estimateChanges.totals.map((total) => {
                    const percent = total.field === 'grossMarginPct';
                    const show = (value: string | null) =>
                      value === null ? '—' : percent ? `${value} %` : formatMoney(value);
                    return (
                      <Table.Tr key={total.field}>
                        <Table.Th>{TOTAL_LABELS[total.field] ?? total.field}</Table.Th>
                        <Table.Td ta="right" c="dimmed">
                          {show(total.before)}
                        </Table.Td>
                        <Table.Td ta="right">{show(total.after)}</Table.Td>
                      </Table.Tr>
                    );
                  })}
                </Table.Tbody>
              </Table>
            </section>
          )}
          <Group justify="flex-end">
            <Button variant="default" onClick={onClose}>
              Close
            </Button>
            <Button
              leftSection={<IconRefresh size={16} />}
              loading={repricing}
              disabled={data.upToDate}
              onClick={onReprice}
            >
              Re-price with the latest book
            </Button>
          </Group>
        </Stack>
      )}
    </Modal>
  );
}
