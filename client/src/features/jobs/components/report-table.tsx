import { Paper, Table, Text, Title } from '@mantine/core';
import type { ReactNode } from 'react';

export type ReportColumn<Row> = {
  header: string;
  cell: (row: Row) => ReactNode;
  /** Figures line up on the right, in a monospaced face. */
  figure?: boolean;
};

type ReportTableProps<Row> = {
  title: string;
  rows: readonly Row[];
  columns: ReadonlyArray<ReportColumn<Row>>;
  rowKey: (row: Row, index: number) => string;
  empty: string;
  minWidth?: number;
};

/** One titled table of the cost report; a section with nothing to show says so in a line. */
export function ReportTable<Row>({
  title,
  rows,
  columns,
  rowKey,
  empty,
  minWidth = 640,
}: ReportTableProps<Row>) {
  return (
    <Paper p="sm" withBorder component="section" aria-label={title}>
      <Title order={3} fz="h5" mb="xs">
        {title}
      </Title>
      {rows.length === 0 ? (
        <Text size="sm" c="dimmed">
          {empty}
        </Text>
      ) : (
        <Table.ScrollContainer minWidth={minWidth}>
          <Table aria-label={title} verticalSpacing={4}>
            <Table.Thead>
              <Table.Tr>
                {columns.map((column) => (
                  <Table.Th key={column.header} ta={column.figure ? 'right' : undefined}>
                    {column.header}
                  </Table.Th>
                ))}
              </Table.Tr>
            </Table.Thead>
            <Table.Tbody>
              {rows.map((row, index) => (
                <Table.Tr key={rowKey(row, index)}>
                  {columns.map((column) => (
                    <Table.Td
                      key={column.header}
                      ta={column.figure ? 'right' : undefined}
                      ff={column.figure ? 'monospace' : undefined}
                    >
                      {column.cell(row)}
                    </Table.Td>
                  ))}
                </Table.Tr>
              ))}
            </Table.Tbody>
          </Table>
        </Table.ScrollContainer>
      )}
    </Paper>
  );
}
