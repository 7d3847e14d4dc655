import { Badge, Text } from '@mantine/core';

export type Money = (amount: string) => string;

/** Over budget shows in red; the colour compares the two figures, not the sign of a variance. */
export function Spent({
  estimated,
  actual,
  money,
}: {
  estimated: string;
  actual: string;
  money: Money;
}) {
  const over = Number(actual) > Number(estimated);
  return (
    <Text span inherit c={over ? 'red.7' : undefined}>
      {money(actual)}
    </Text>
  );
}

/** An item's description, its code, and a mark when the crew logged something the budget lacks. */
export function Item({
  row,
}: {
  row: { code: string | null; description: string; budgeted?: boolean };
}) {
  return (
    <>
      {row.description}
      {row.code && (
        <Text span size="xs" c="dimmed" ff="monospace" ml={6}>
          {row.code}
        </Text>
      )}
      {row.budgeted === false && (
        <Badge size="xs" variant="light" color="clay" ml={6} tt="none">
          not in the budget
        </Badge>
      )}
    </>
  );
}
