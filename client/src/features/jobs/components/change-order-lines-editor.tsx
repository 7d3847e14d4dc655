import { ActionIcon, Button, Checkbox, Select, Stack, Table, Text, TextInput } from '@mantine/core';
import type { UseFormReturnType } from '@mantine/form';
import type { CreateChangeOrderRequest, createChangeOrderRequestSchema } from '@pondwright/shared';
import { IconPlus, IconTrash } from '@tabler/icons-react';
import type { z } from 'zod';
import { CATEGORY_LABELS } from '@/lib/price-book-labels';
import { newId } from '../utils/new-id';

export type ChangeOrderFormValues = z.input<typeof createChangeOrderRequestSchema>;
export type ChangeOrderForm = UseFormReturnType<ChangeOrderFormValues, CreateChangeOrderRequest>;

const CATEGORY_OPTIONS = Object.entries(CATEGORY_LABELS).map(([value, label]) => ({
  value,
  label,
}));

/** A new line; its id is made here because the server keys the change's lines by the client's ids. */
export function blankChangeLine(): NonNullable<ChangeOrderFormValues['lines']>[number] {
  return {
    id: newId(),
    category: 'materials',
    description: '',
    quantity: '1',
    unit: 'ea',
    unitCost: '',
    taxable: true,
  };
}

/** The change's new lines, priced by the server with the accepted version's price book on submit. */
export function ChangeOrderLinesEditor({ form }: { form: ChangeOrderForm }) {
  const lines = form.getValues().lines ?? [];
  return (
    <Stack gap="xs">
      <Text size="sm" fw={600}>
        New work
      </Text>
      {lines.length > 0 && (
        <Table.ScrollContainer minWidth={760}>
          <Table aria-label="Lines of the change" verticalSpacing={4} highlightOnHover={false}>
            <Table.Thead>
              <Table.Tr>
                <Table.Th>Description</Table.Th>
                <Table.Th>Category</Table.Th>
                <Table.Th>Quantity</Table.Th>
                <Table.Th>Unit</Table.Th>
                <Table.Th>Unit cost</Table.Th>
                <Table.Th>Taxable</Table.Th>
                <Table.Th />
              </Table.Tr>
            </Table.Thead>
            <Table.Tbody>
              {lines.map((line, index) => {
                const name = `line ${index + 1}`;
                const path = (field: string) => `lines.${index}.${field}`;
                return (
                  <Table.Tr key={line.id}>
                    <Table.Td>
                      <TextInput
                        size="xs"
                        aria-label={`Description of ${name}`}
                        placeholder="e.g. Extra boulders for the stream"
                        key={form.key(path('description'))}
                        {...form.getInputProps(path('description'))}
                      />
                    </Table.Td>
                    <Table.Td w={140}>
                      <Select
                        size="xs"
                        aria-label={`Category of ${name}`}
                        data={CATEGORY_OPTIONS}
                        allowDeselect={false}
                        key={form.key(path('category'))}
                        {...form.getInputProps(path('category'))}
                      />
                    </Table.Td>
                    <Table.Td w={90}>
                      <TextInput
                        size="xs"
                        inputMode="decimal"
                        aria-label={`Quantity of ${name}`}
                        key={form.key(path('quantity'))}
                        {...form.getInputProps(path('quantity'))}
                      />
                    </Table.Td>
                    <Table.Td w={80}>
                      <TextInput
                        size="xs"
                        aria-label={`Unit of ${name}`}
                        key={form.key(path('unit'))}
                        {...form.getInputProps(path('unit'))}
                      />
                    </Table.Td>
                    <Table.Td w={110}>
                      <TextInput
                        size="xs"
                        inputMode="decimal"
                        aria-label={`Unit cost of ${name}`}
                        placeholder="0.00"
                        key={form.key(path('unitCost'))}
                        {...form.getInputProps(path('unitCost'))}
                      />
                    </Table.Td>
                    <Table.Td w={70}>
                      <Checkbox
                        aria-label={`${name} is taxable`}
                        key={form.key(path('taxable'))}
                        {...form.getInputProps(path('taxable'), { type: 'checkbox' })}
                      />
                    </Table.Td>
                    <Table.Td w={40}>
                      <ActionIcon
                        variant="subtle"
                        color="red"
                        aria-label={`Remove ${name}`}
                        onClick={() => form.removeListItem('lines', index)}
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
      <div>
        <Button
          size="xs"
          variant="light"
          leftSection={<IconPlus size={14} />}
          onClick={() => form.insertListItem('lines', blankChangeLine())}
        >
          Add a line
        </Button>
      </div>
    </Stack>
  );
}
