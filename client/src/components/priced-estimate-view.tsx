import { Alert, Badge, Group, List, Paper, Stack, Table, Text, Title } from '@mantine/core';
import type { Caution } from '@pondwright/shared/engine';
import type { PricedEstimate, PriceCategory } from '@pondwright/shared/pricing';
import { IconAlertTriangle } from '@tabler/icons-react';
import { formatMoney } from '@/lib/format';
import { CATEGORY_LABELS } from '@/lib/price-book-labels';

function TotalRow({ label, value, strong }: { label: string; value: string; strong?: boolean }) {
  return (
    <Table.Tr>
      <Table.Th fw={strong ? 700 : 500}>{label}</Table.Th>
      <Table.Td ta="right" ff="monospace" fw={strong ? 700 : undefined}>
        {value}
      </Table.Td>
    </Table.Tr>
  );
}

type PricedEstimateViewProps = {
  priced: PricedEstimate;
  /** The takeoff's warnings and safety cautions, shown above the lines when given. */
  cautions?: readonly Caution[];
};

/**
 * A priced estimate as a customer's quote would group it: what the book could not price, approval flags,
 * cautions, lines by category (manual lines marked), then the totals.
 */
export function PricedEstimateView({ priced, cautions = [] }: PricedEstimateViewProps) {
  const money = (amount: string) => formatMoney(amount, priced.currency);
  const totals = priced.totals;
  const groups = (Object.keys(CATEGORY_LABELS) as PriceCategory[])
    .map((category) => ({
      category,
      lines: priced.lines.filter((line) => line.category === category),
      subtotal: priced.categories.find((entry) => entry.category === category),
    }))
    .filter((group) => group.lines.length > 0);

  return (
    <Stack gap="lg">
      {!priced.complete && priced.missing.length > 0 && (
        <Alert
          color="clay"
          variant="light"
          icon={<IconAlertTriangle />}
          title="The price book could not price everything"
        >
          <List size="sm">
            {priced.missing.map((item, index) => (
              <List.Item key={index}>{item.message}</List.Item>
            ))}
          </List>
        </Alert>
      )}
      {cautions.length > 0 && (
        <Alert color="yellow" variant="light" title="Cautions from the takeoff">
          <List size="sm">
            {cautions.map((caution) => (
              <List.Item key={`${caution.code}-${caution.field ?? ''}`}>
                {caution.message}
              </List.Item>
            ))}
          </List>
        </Alert>
      )}
      {priced.approval.needsApproval && (
        <Alert color="red" variant="light" title="Needs an owner's approval">
          <List size="sm">
            {priced.approval.reasons.map((reason) => (
              <List.Item key={reason.code}>{reason.message}</List.Item>
            ))}
          </List>
        </Alert>
      )}
      {groups.map(({ category, lines, subtotal }) => (
        <Paper p="sm" key={category} component="section" aria-labelledby={`lines-${category}`}>
          <Title order={3} fz="h5" id={`lines-${category}`} mb="xs">
            {CATEGORY_LABELS[category]}
          </Title>
          <Table.ScrollContainer minWidth={720}>
            <Table aria-label={`${CATEGORY_LABELS[category]} lines`} verticalSpacing={6}>
              <Table.Thead>
                <Table.Tr>
                  <Table.Th>Item</Table.Th>
                  <Table.Th ta="right">Quantity</Table.Th>
                  <Table.Th ta="right">Unit cost</Table.Th>
                  <Table.Th ta="right">Cost</Table.Th>
                  <Table.Th ta="right">Markup</Table.Th>
                  <Table.Th ta="right">Price</Table.Th>
                </Table.Tr>
              </Table.Thead>
              <Table.Tbody>
                {lines.map((line) => (
                  <Table.Tr key={line.id}>
                    <Table.Td>
                      {line.description}
                      {line.source.startsWith('manual') && (
                        <Badge size="xs" variant="light" color="clay" ml={6}>
                          manual
                        </Badge>
                      )}
                      {line.taxable && (
                        <Badge size="xs" variant="light" color="stone" ml={6}>
                          taxable
                        </Badge>
                      )}
                    </Table.Td>
                    <Table.Td ta="right">
                      {line.quantity} {line.unit}
                    </Table.Td>
                    <Table.Td ta="right" ff="monospace">
                      {money(line.unitCost)}
                    </Table.Td>
                    <Table.Td ta="right" ff="monospace">
                      {money(line.extendedCost)}
                    </Table.Td>
                    <Table.Td ta="right">{line.markupPct} %</Table.Td>
                    <Table.Td ta="right" ff="monospace">
                      {money(line.price)}
                    </Table.Td>
                  </Table.Tr>
                ))}
              </Table.Tbody>
              {subtotal && (
                <Table.Tfoot>
                  <Table.Tr>
                    <Table.Th colSpan={3}>{CATEGORY_LABELS[category]} subtotal</Table.Th>
                    <Table.Td ta="right" ff="monospace">
                      {money(subtotal.cost)}
                    </Table.Td>
                    <Table.Td />
                    <Table.Td ta="right" ff="monospace" fw={600}>
                      {money(subtotal.price)}
                    </Table.Td>
                  </Table.Tr>
                </Table.Tfoot>
              )}
            </Table>
          </Table.ScrollContainer>
        </Paper>
      ))}
      <Paper p="sm" maw={420} ml="auto" w="100%" component="section" aria-label="Totals">
        <Table verticalSpacing={4}>
          <Table.Tbody>
            <TotalRow label="Subtotal" value={money(totals.subtotalPrice)} />
            {Number(totals.discount) !== 0 && (
              <TotalRow
                label={`Discount (${totals.discountPct} %)`}
                value={`−${money(totals.discount)}`}
              />
            )}
            {priced.adjustments.map((adjustment) => (
              <TotalRow
                key={adjustment.id}
                label={adjustment.description}
                value={money(adjustment.amount)}
              />
            ))}
            <TotalRow label={`Sales tax (${totals.salesTaxPct} %)`} value={money(totals.tax)} />
            <TotalRow label="Total" value={money(totals.total)} strong />
            <TotalRow label={`Deposit (${totals.depositPct} %)`} value={money(totals.deposit)} />
          </Table.Tbody>
        </Table>
        <Group justify="space-between" mt="sm" px="xs">
          <Text size="sm" c="dimmed">
            Gross profit {money(totals.grossProfit)}
          </Text>
          <Text size="sm" fw={600}>
            Gross margin {totals.grossMarginPct === null ? '—' : `${totals.grossMarginPct} %`}
          </Text>
        </Group>
      </Paper>
    </Stack>
  );
}
