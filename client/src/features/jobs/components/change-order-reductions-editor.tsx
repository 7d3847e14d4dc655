import { ActionIcon, Button, Select, Stack, Table, Text, TextInput } from '@mantine/core';
import type { BudgetLine } from '@pondwright/shared';
import { IconMinus, IconTrash } from '@tabler/icons-react';
import type { ChangeOrderForm } from './change-order-lines-editor';

/**
 * Work taken off the job (a credit): lines of the job's budget, each with the quantity it keeps ("0"
 * takes it off). The server prices what comes off at the rates the line was sold at.
 */
export function ChangeOrderReductionsEditor({
  form,
  budgetLines,
}: {
  form: ChangeOrderForm;
  budgetLines: BudgetLine[];
}) {
  const reductions = form.getValues().reductions ?? [];
  const chosen = new Set(reductions.map((reduction) => reduction.lineId));
  const byId = new Map(budgetLines.map((line) => [line.id, line]));
  const options = (own: string) =>
    budgetLines
      .filter((line) => line.id === own || !chosen.has(line.id))
      .map((line) => ({
        value: line.id,
        label: `${line.description} (${line.quantity} ${line.unit})`,
      }));
  return (
    <Stack gap="xs">
      <Text size="sm" fw={600}>
        Work taken off
      </Text>
      {reductions.length > 0 && (
        <Table.ScrollContainer minWidth={640}>
          <Table aria-label="Work taken off" verticalSpacing={4} highlightOnHover={false}>
            <Table.Thead>
              <Table.Tr>
                <Table.Th>Line of the job</Table.Th>
                <Table.Th>In the job now</Table.Th>
                <Table.Th>Quantity kept</Table.Th>
                <Table.Th />
              </Table.Tr>
            </Table.Thead>
            <Table.Tbody>
              {reductions.map((reduction, index) => {
                const name = `reduction ${index + 1}`;
                const path = (field: string) => `reductions.${index}.${field}`;
                const line = byId.get(reduction.lineId);
                return (
                  <Table.Tr key={index}>
                    <Table.Td>
                      <Select
                        size="xs"
                        aria-label={`Line of ${name}`}
                        placeholder="Choose a line of the job"
                        data={options(reduction.lineId)}
                        searchable
                        allowDeselect={false}
                        key={form.key(path('lineId'))}
                        {...form.getInputProps(path('lineId'))}
                      />
                    </Table.Td>
                    <Table.Td w={120}>
                      <Text size="sm">{line ? `${line.quantity} ${line.unit}` : ''}</Text>
                    </Table.Td>
                    <Table.Td w={120}>
                      <TextInput
                        size="xs"
                        inputMode="decimal"
                        aria-label={`Quantity kept of ${name}`}
                        rightSection={
                          line ? (
                            <Text size="xs" c="dimmed">
                              {line.unit}
                            </Text>
                          ) : null
                        }
                        rightSectionWidth={48}
                        key={form.key(path('newQuantity'))}
                        {...form.getInputProps(path('newQuantity'))}
                      />
                    </Table.Td>
                    <Table.Td w={40}>
                      <ActionIcon
                        variant="subtle"
                        color="red"
                        aria-label={`Remove ${name}`}
                        onClick={() => form.removeListItem('reductions', index)}
                      >
                        <IconTrash size={16} />
                      </ActionIcon>
                    </Table.Td>
                  </Table.Tr>
                );
              })}
            </Table.Tbody>
          </Table>
        </Table.ScrollContainer>
      )}
      <Text size="xs" c="dimmed">
        Keep 0 to take a line off entirely. What comes off is credited at the price it was sold at.
      </Text>
      <div>
        <Button
          size="xs"
          variant="light"
          leftSection={<IconMinus size={14} />}
          disabled={chosen.size >= budgetLines.length}
          onClick={() => form.insertListItem('reductions', { lineId: '', newQuantity: '0' })}
        >
          Take off work
        </Button>
      </div>
    </Stack>
  );
}
