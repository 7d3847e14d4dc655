import { ActionIcon, Button, Checkbox, Select, Stack, Table, Text, TextInput } from '@mantine/core';
import type { ManualLine } from '@pondwright/shared';
import { IconPlus, IconTrash } from '@tabler/icons-react';
import type { FieldError } from '@/lib/api-error';
import { CATEGORY_LABELS } from '@/lib/price-book-labels';

const CATEGORY_OPTIONS = Object.entries(CATEGORY_LABELS).map(([value, label]) => ({
  value,
  label,
}));
const KIND_OPTIONS = [
  { value: 'base', label: 'Base' },
  { value: 'add-on', label: 'Add-on' },
  { value: 'alternate', label: 'Alternate' },
];

let created = 0;
const newLineId = () => `m-${Date.now().toString(36)}-${++created}`;

type ManualLinesEditorProps = {
  lines: ManualLine[];
  onChange: (lines: ManualLine[]) => void;
  errors: FieldError[];
};

/** Lines the estimator adds by hand; the server prices them with the category's markup on save. */
export function ManualLinesEditor({ lines, onChange, errors }: ManualLinesEditorProps) {
  const errorFor = (index: number, field: keyof ManualLine) =>
    errors.find((error) => error.field === `manualLines.${index}.${field}`)?.message;
  const update = (index: number, patch: Partial<ManualLine>) =>
    onChange(lines.map((line, at) => (at === index ? { ...line, ...patch } : line)));
  const add = () =>
    onChange([
      ...lines,
      {
        id: newLineId(),
        category: 'other',
        description: '',
        quantity: '1',
        unit: 'ea',
        unitCost: '0',
        taxable: true,
        kind: 'base',
      },
    ]);

  return (
    <Stack gap="xs">
      {lines.length === 0 ? (
        <Text size="sm" c="dimmed">
          No manual lines. Add one for anything the takeoff does not measure.
        </Text>
      ) : (
        <Table.ScrollContainer minWidth={860}>
          <Table aria-label="Manual lines" verticalSpacing={4} highlightOnHover={false}>
            <Table.Thead>
              <Table.Tr>
                <Table.Th>Category</Table.Th>
                <Table.Th>Description</Table.Th>
                <Table.Th>Quantity</Table.Th>
                <Table.Th>Unit</Table.Th>
                <Table.Th>Unit cost</Table.Th>
                <Table.Th>Taxable</Table.Th>
                <Table.Th>Kind</Table.Th>
                <Table.Th />
              </Table.Tr>
            </Table.Thead>
            <Table.Tbody>
              {lines.map((line, index) => {
                const name = line.description || `line ${index + 1}`;
                return (
                  <Table.Tr key={line.id}>
                    <Table.Td w={140}>
                      <Select
                        size="xs"
                        aria-label={`Category for ${name}`}
                        data={CATEGORY_OPTIONS}
                        value={line.category}
                        allowDeselect={false}
                        onChange={(value) =>
                          value && update(index, { category: value as ManualLine['category'] })
                        }
                      />
                    </Table.Td>
                    <Table.Td>
                      <TextInput
                        size="xs"
                        aria-label={`Description for ${name}`}
                        value={line.description}
                        error={errorFor(index, 'description')}
                        onChange={(event) =>
                          update(index, { description: event.currentTarget.value })
                        }
                      />
                    </Table.Td>
                    <Table.Td w={90}>
                      <TextInput
                        size="xs"
                        inputMode="decimal"
                        aria-label={`Quantity for ${name}`}
                        value={line.quantity}
                        error={errorFor(index, 'quantity')}
                        onChange={(event) => update(index, { quantity: event.currentTarget.value })}
                      />
                    </Table.Td>
                    <Table.Td w={80}>
                      <TextInput
                        size="xs"
                        aria-label={`Unit for ${name}`}
                        value={line.unit}
                        error={errorFor(index, 'unit')}
                        onChange={(event) => update(index, { unit: event.currentTarget.value })}
                      />
                    </Table.Td>
                    <Table.Td w={110}>
                      <TextInput
                        size="xs"
                        inputMode="decimal"
                        aria-label={`Unit cost for ${name}`}
                        value={line.unitCost}
                        error={errorFor(index, 'unitCost')}
                        onChange={(event) => update(index, { unitCost: event.currentTarget.value })}
                      />
                    </Table.Td>
                    <Table.Td w={70}>
                      <Checkbox
                        aria-label={`Taxable: ${name}`}
                        checked={line.taxable}
                        onChange={(event) =>
                          update(index, { taxable: event.currentTarget.checked })
                        }
                      />
                    </Table.Td>
                    <Table.Td w={130}>
                      <Select
                        size="xs"
                        aria-label={`Kind for ${name}`}
                        data={KIND_OPTIONS}
                        value={line.kind}
                        allowDeselect={false}
                        onChange={(value) =>
                          value && update(index, { kind: value as ManualLine['kind'] })
                        }
                      />
                    </Table.Td>
                    <Table.Td w={40}>
                      <ActionIcon
                        variant="subtle"
                        color="red"
                        aria-label={`Remove ${name}`}
                        onClick={() => onChange(lines.filter((_, at) => at !== index))}
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
        <Button size="xs" variant="light" leftSection={<IconPlus size={14} />} onClick={add}>
          Add a manual line
        </Button>
      </div>
    </Stack>
  );
}
