import { Table } from '@mantine/core';
import type { PriceBookChange } from '@pondwright/shared/pricing';
import { fieldLabel, SECTION_LABELS } from '@/lib/price-book-labels';

function showValue(value: unknown): string {
  if (value === null || value === undefined || value === '') return '—';
  if (typeof value === 'boolean') return value ? 'Yes' : 'No';
  if (typeof value === 'object') return JSON.stringify(value);
  return String(value);
}

type PriceBookChangesTableProps = {
  changes: readonly PriceBookChange[];
  /** The table's accessible name, e.g. "Changes in version 3". */
  label: string;
};

/** What changed between two price-book versions: one row per changed field, added or removed item. */
export function PriceBookChangesTable({ changes, label }: PriceBookChangesTableProps) {
  return (
    <Table.ScrollContainer minWidth={560}>
      <Table aria-label={label} verticalSpacing={6}>
        <Table.Thead>
          <Table.Tr>
            <Table.Th>Section</Table.Th>
            <Table.Th>Code</Table.Th>
            <Table.Th>Field</Table.Th>
            <Table.Th>Before</Table.Th>
            <Table.Th>After</Table.Th>
          </Table.Tr>
        </Table.Thead>
        <Table.Tbody>
          {changes.map((change, index) => (
            <Table.Tr key={index}>
              <Table.Td>{SECTION_LABELS[change.section] ?? change.section}</Table.Td>
              <Table.Td ff="monospace">{change.code || '—'}</Table.Td>
              <Table.Td>
                {change.field === '(item)'
                  ? change.before === null
                    ? 'Added'
                    : 'Removed'
                  : fieldLabel(change.field)}
              </Table.Td>
              <Table.Td c="dimmed" style={{ textDecoration: 'line-through' }}>
                {showValue(change.before)}
              </Table.Td>
              <Table.Td fw={500}>{showValue(change.after)}</Table.Td>
            </Table.Tr>
          ))}
        </Table.Tbody>
      </Table>
    </Table.ScrollContainer>
  );
}
