import { Badge, Group, Stack, Table, Text } from '@mantine/core';
import type { ChangeOrderView } from '@pondwright/shared';
import { formatMoney } from '@/lib/format';
import { isCredit, lineQuantityText } from '../utils/change-order-text';
import { CHANGE_ORDER_LINE_LABELS } from '../utils/labels';

function Figure({ label, value }: { label: string; value: string }) {
  return (
    <Stack gap={0}>
      <Text size="xs" c="dimmed">
        {label}
      </Text>
      <Text fw={600} ff="monospace" aria-label={label}>
        {value}
      </Text>
    </Stack>
  );
}

/**
 * A priced change: each line added or taken off with what it changes the price by, the net change
 * (a credit when work taken off outweighs work added) and the job's total before and after.
 */
export function ChangeOrderSummary({
  order,
  currency,
}: {
  order: ChangeOrderView;
  currency: string;
}) {
  const money = (amount: string) => formatMoney(amount, currency);
  const credit = isCredit(order);
  return (
    <Stack gap="sm">
      <Table aria-label={`Lines of change order ${order.number}`} verticalSpacing={4}>
        <Table.Thead>
          <Table.Tr>
            <Table.Th>Item</Table.Th>
            <Table.Th>Change</Table.Th>
            <Table.Th ta="right">Quantity</Table.Th>
            <Table.Th ta="right">Price</Table.Th>
          </Table.Tr>
        </Table.Thead>
        <Table.Tbody>
          {order.lines.map((line, index) => (
            <Table.Tr key={index}>
              <Table.Td>{line.description}</Table.Td>
              <Table.Td>
                <Badge
                  variant="light"
                  tt="none"
                  color={line.change === 'added' ? 'blue' : 'clay'}
                  size="sm"
                >
                  {CHANGE_ORDER_LINE_LABELS[line.change]}
                </Badge>
              </Table.Td>
              <Table.Td ta="right">{lineQuantityText(line)}</Table.Td>
              <Table.Td ta="right" ff="monospace">
                {money(line.price)}
              </Table.Td>
            </Table.Tr>
          ))}
        </Table.Tbody>
      </Table>
      <Group gap="xl">
        <Figure label="Before tax" value={money(order.priceBeforeTax)} />
        <Figure label="Tax" value={money(order.tax)} />
        <Figure
          label={credit ? 'Credit to the homeowner' : 'The change adds'}
          value={money(order.total)}
        />
        <Figure label={credit ? 'Cost change' : 'Its cost'} value={money(order.cost)} />
      </Group>
      <Text size="sm" aria-label="Job total">
        Job total {money(order.previousJobTotal)} → <b>{money(order.newJobTotal)}</b> once the
        homeowner accepts.
      </Text>
    </Stack>
  );
}
