import { Skeleton, Table, Text } from '@mantine/core';
import type { ReactNode } from 'react';

type TableStatusRowsProps = {
  /** Columns the rows span. */
  columns: number;
  /** True while the first page is loading: skeleton rows stand in for it. */
  loading: boolean;
  /** True when the page came back empty: one row with `emptyMessage`. */
  empty: boolean;
  emptyMessage: ReactNode;
};

/** The loading and empty rows of a server-paged table body, so each table keeps only its data rows. */
export function TableStatusRows({ columns, loading, empty, emptyMessage }: TableStatusRowsProps) {
  if (loading) {
    return Array.from({ length: 5 }, (_, index) => (
      <Table.Tr key={index}>
        <Table.Td colSpan={columns}>
          <Skeleton height={18} />
        </Table.Td>
      </Table.Tr>
    ));
  }
  if (!empty) return null;
  return (
    <Table.Tr>
      <Table.Td colSpan={columns}>
        <Text c="dimmed" size="sm" ta="center" py="md">
          {emptyMessage}
        </Text>
      </Table.Td>
    </Table.Tr>
  );
}
