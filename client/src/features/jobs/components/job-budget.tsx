import { Group, Paper, Stack, Table, Text, Title } from '@mantine/core';
import type { BudgetLine, JobBudget, JobView } from '@pondwright/shared';
import type { PriceCategory } from '@pondwright/shared/pricing';
import { formatMoney } from '@/lib/format';
import { CATEGORY_LABELS } from '@/lib/price-book-labels';

function byCategory<Line extends { category: PriceCategory }>(lines: readonly Line[]) {
  return (Object.keys(CATEGORY_LABELS) as PriceCategory[])
    .map((category) => ({ category, lines: lines.filter((line) => line.category === category) }))
    .filter((group) => group.lines.length > 0);
}

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

/** The accepted version's priced lines by category: what the job was sold for and should cost. */
export function JobBudgetView({ budget }: { budget: JobBudget }) {
  const money = (amount: string) => formatMoney(amount, budget.currency);
  return (
    <Stack gap="md">
      <Group gap="xl">
        <Figure label="Sold for (before tax)" value={money(budget.priceBeforeTax)} />
        <Figure label="Budgeted cost" value={money(budget.cost)} />
        <Figure label="Labor hours" value={budget.laborHours} />
        <Figure label="Crew days" value={budget.crewDays} />
      </Group>
      <Text size="xs" c="dimmed">
        From version {budget.versionNumber} as the homeowner accepted it, with the options they
        chose.
      </Text>
      {byCategory(budget.lines).map(({ category, lines }) => (
        <Paper p="sm" key={category} withBorder>
          <Title order={3} fz="h5" mb="xs">
            {CATEGORY_LABELS[category]}
          </Title>
          <Table.ScrollContainer minWidth={640}>
            <Table aria-label={`${CATEGORY_LABELS[category]} budget`} verticalSpacing={4}>
              <Table.Thead>
                <Table.Tr>
                  <Table.Th>Item</Table.Th>
                  <Table.Th ta="right">Quantity</Table.Th>
                  <Table.Th ta="right">Unit cost</Table.Th>
                  <Table.Th ta="right">Cost</Table.Th>
                  <Table.Th ta="right">Price</Table.Th>
                </Table.Tr>
              </Table.Thead>
              <Table.Tbody>
                {lines.map((line: BudgetLine) => (
                  <Table.Tr key={line.id}>
                    <Table.Td>{line.description}</Table.Td>
                    <Table.Td ta="right">
                      {line.quantity} {line.unit}
                    </Table.Td>
                    <Table.Td ta="right" ff="monospace">
                      {money(line.unitCost)}
                    </Table.Td>
                    <Table.Td ta="right" ff="monospace">
                      {money(line.extendedCost)}
                    </Table.Td>
                    <Table.Td ta="right" ff="monospace">
                      {money(line.price)}
                    </Table.Td>
                  </Table.Tr>
                ))}
              </Table.Tbody>
            </Table>
          </Table.ScrollContainer>
        </Paper>
      ))}
    </Stack>
  );
}

/** What the crew lead builds with: the same lines, quantities only, never what they cost. */
export function CrewBudgetView({ lines }: { lines: JobView['crewBudget'] }) {
  if (lines.length === 0) {
    return (
      <Text size="sm" c="dimmed">
        The job has no lines to build from.
      </Text>
    );
  }
  return (
    <Stack gap="md">
      {byCategory(lines).map(({ category, lines: group }) => (
        <Paper p="sm" key={category} withBorder>
          <Title order={3} fz="h5" mb="xs">
            {CATEGORY_LABELS[category]}
          </Title>
          <Table aria-label={`${CATEGORY_LABELS[category]} to build`} verticalSpacing={4}>
            <Table.Thead>
              <Table.Tr>
                <Table.Th>Item</Table.Th>
                <Table.Th>Code</Table.Th>
                <Table.Th ta="right">Quantity</Table.Th>
              </Table.Tr>
            </Table.Thead>
            <Table.Tbody>
              {group.map((line) => (
                <Table.Tr key={line.id}>
                  <Table.Td>{line.description}</Table.Td>
                  <Table.Td ff="monospace">{line.code ?? ''}</Table.Td>
                  <Table.Td ta="right">
                    {line.quantity} {line.unit}
                  </Table.Td>
                </Table.Tr>
              ))}
            </Table.Tbody>
          </Table>
        </Paper>
      ))}
    </Stack>
  );
}
