import {
  ActionIcon,
  Button,
  Checkbox,
  Group,
  NativeSelect,
  Pagination,
  Select,
  Table,
  Text,
  TextInput,
  Tooltip,
  UnstyledButton,
  VisuallyHidden,
} from '@mantine/core';
import {
  IconArrowsSort,
  IconPlus,
  IconSearch,
  IconSortAscending,
  IconSortDescending,
  IconTrash,
} from '@tabler/icons-react';
import { useMemo, useState, type ReactNode } from 'react';
import { NumberTextInput } from './number-text-input';

type Option = { value: string; label: string };

/** How a cell is edited in place; `get` reads the row's value, `set` returns the changed row. */
export type CellEditor<Row> =
  | { type: 'text'; get: (row: Row) => string; set: (row: Row, value: string) => Row }
  | {
      type: 'number';
      get: (row: Row) => number | string | undefined;
      /** Receives a number when the text reads as one, otherwise the text, for the schema to reject. */
      set: (row: Row, value: number | string | undefined) => Row;
    }
  | {
      type: 'select';
      options: ReadonlyArray<Option>;
      get: (row: Row) => string;
      set: (row: Row, value: string) => Row;
    }
  | { type: 'checkbox'; get: (row: Row) => boolean; set: (row: Row, value: boolean) => Row };

export type DataTableColumn<Row> = {
  /** The row's field, also the key its error is reported under. */
  key: string;
  header: string;
  sortValue?: (row: Row) => string | number;
  render?: (row: Row, index: number) => ReactNode;
  editor?: CellEditor<Row>;
  align?: 'left' | 'right';
  minWidth?: number;
};

type Filter<Row> = {
  label: string;
  options: ReadonlyArray<Option>;
  matches: (row: Row, value: string) => boolean;
};

type DataTableProps<Row> = {
  /** Names the table for screen readers, e.g. "Materials". */
  label: string;
  rows: ReadonlyArray<Row>;
  columns: ReadonlyArray<DataTableColumn<Row>>;
  /** How a row is named in its inputs' labels, e.g. its code. */
  rowLabel: (row: Row, index: number) => string;
  searchText?: (row: Row) => string;
  filter?: Filter<Row>;
  pageSize?: number;
  readOnly?: boolean;
  cellError?: (index: number, key: string) => string | undefined;
  onRowChange?: (index: number, row: Row) => void;
  onAdd?: () => void;
  addLabel?: string;
  onDelete?: (index: number) => void;
  rowActions?: (row: Row, index: number) => ReactNode;
  emptyLabel?: string;
};

type Sort = { key: string; direction: 'ascending' | 'descending' } | null;

const collator = new Intl.Collator(undefined, { numeric: true, sensitivity: 'base' });

function compare(a: string | number, b: string | number): number {
  return typeof a === 'number' && typeof b === 'number'
    ? a - b
    : collator.compare(String(a), String(b));
}

function EditableCell<Row>({
  row,
  editor,
  label,
  error,
  onChange,
}: {
  row: Row;
  editor: CellEditor<Row>;
  label: string;
  error?: string;
  onChange: (row: Row) => void;
}) {
  switch (editor.type) {
    case 'text':
      return (
        <TextInput
          size="xs"
          aria-label={label}
          value={editor.get(row)}
          error={error}
          onChange={(event) => onChange(editor.set(row, event.currentTarget.value))}
        />
      );
    case 'number':
      return (
        <NumberTextInput
          size="xs"
          aria-label={label}
          value={editor.get(row)}
          error={error}
          onChange={(value) => onChange(editor.set(row, value))}
        />
      );
    case 'select':
      return (
        <NativeSelect
          size="xs"
          aria-label={label}
          data={editor.options as Option[]}
          value={editor.get(row)}
          error={error}
          onChange={(event) => onChange(editor.set(row, event.currentTarget.value))}
        />
      );
    case 'checkbox':
      return (
        <Checkbox
          aria-label={label}
          checked={editor.get(row)}
          error={error}
          onChange={(event) => onChange(editor.set(row, event.currentTarget.checked))}
        />
      );
  }
}

function readOnlyValue<Row>(editor: CellEditor<Row>, row: Row): ReactNode {
  switch (editor.type) {
    case 'checkbox':
      return editor.get(row) ? 'Yes' : 'No';
    case 'select':
      return editor.options.find((option) => option.value === editor.get(row))?.label;
    default:
      return editor.get(row);
  }
}

/**
 * A Mantine table with sorting by column, a text search, an optional filter, pagination and,
 * unless read-only, editing in place. Rows keep their index in `rows` through sorting and
 * filtering, so edits and errors always reach the right row.
 */
export function DataTable<Row>({
  label,
  rows,
  columns,
  rowLabel,
  searchText,
  filter,
  pageSize = 10,
  readOnly = false,
  cellError,
  onRowChange,
  onAdd,
  addLabel = 'Add a row',
  onDelete,
  rowActions,
  emptyLabel = 'Nothing here yet.',
}: DataTableProps<Row>) {
  const [query, setQuery] = useState('');
  const [filterValue, setFilterValue] = useState<string | null>(null);
  const [sort, setSort] = useState<Sort>(null);
  const [page, setPage] = useState(1);

  const visible = useMemo(() => {
    const needle = query.trim().toLowerCase();
    const indexed = rows
      .map((row, index) => ({ row, index }))
      .filter(({ row }) => !needle || (searchText?.(row) ?? '').toLowerCase().includes(needle))
      .filter(({ row }) => !filter || !filterValue || filter.matches(row, filterValue));
    const column = sort && columns.find((candidate) => candidate.key === sort.key);
    if (!column?.sortValue) return indexed;
    const sign = sort?.direction === 'descending' ? -1 : 1;
    return [...indexed].sort(
      (a, b) => sign * compare(column.sortValue!(a.row), column.sortValue!(b.row)),
    );
  }, [rows, query, searchText, filter, filterValue, sort, columns]);

  const pages = Math.max(1, Math.ceil(visible.length / pageSize));
  const currentPage = Math.min(page, pages);
  const shown = visible.slice((currentPage - 1) * pageSize, currentPage * pageSize);
  const editing = !readOnly && onRowChange !== undefined;
  const hasActions = (!readOnly && onDelete !== undefined) || rowActions !== undefined;

  const toggleSort = (key: string) => {
    setSort((current) =>
      current?.key !== key
        ? { key, direction: 'ascending' }
        : current.direction === 'ascending'
          ? { key, direction: 'descending' }
          : null,
    );
  };

  const add = () => {
    // The new row is appended: show the end of the unfiltered list, where it is.
    setQuery('');
    setFilterValue(null);
    setSort(null);
    setPage(Number.MAX_SAFE_INTEGER);
    onAdd?.();
  };

  return (
    <>
      <Group justify="space-between" mb="sm" gap="sm">
        <Group gap="sm">
          {searchText && (
            <TextInput
              size="sm"
              w={260}
              leftSection={<IconSearch size={16} />}
              placeholder="Search"
              aria-label={`Search ${label.toLowerCase()}`}
              value={query}
              onChange={(event) => {
                setQuery(event.currentTarget.value);
                setPage(1);
              }}
            />
          )}
          {filter && (
            <Select
              size="sm"
              w={200}
              label={<VisuallyHidden>{filter.label}</VisuallyHidden>}
              aria-label={filter.label}
              placeholder={filter.label}
              data={filter.options as Option[]}
              value={filterValue}
              clearable
              onChange={(value) => {
                setFilterValue(value);
                setPage(1);
              }}
            />
          )}
        </Group>
        {!readOnly && onAdd && (
          <Button size="sm" variant="light" leftSection={<IconPlus size={16} />} onClick={add}>
            {addLabel}
          </Button>
        )}
      </Group>
      <Table.ScrollContainer minWidth={columns.reduce((sum, c) => sum + (c.minWidth ?? 120), 80)}>
        <Table aria-label={label} verticalSpacing="xs" highlightOnHover={!editing}>
          <Table.Thead>
            <Table.Tr>
              {columns.map((column) => {
                const sorted = sort?.key === column.key ? sort.direction : undefined;
                const SortIcon =
                  sorted === 'ascending'
                    ? IconSortAscending
                    : sorted === 'descending'
                      ? IconSortDescending
                      : IconArrowsSort;
                return (
                  <Table.Th
                    key={column.key}
                    aria-sort={sorted ?? (column.sortValue ? 'none' : undefined)}
                    style={{ minWidth: column.minWidth, textAlign: column.align }}
                  >
                    {column.sortValue ? (
                      <UnstyledButton
                        onClick={() => toggleSort(column.key)}
                        fw={600}
                        fz="sm"
                        aria-label={`Sort by ${column.header}`}
                      >
                        <Group gap={4} wrap="nowrap">
                          {column.header}
                          <SortIcon size={14} aria-hidden />
                        </Group>
                      </UnstyledButton>
                    ) : (
                      column.header
                    )}
                  </Table.Th>
                );
              })}
              {hasActions && (
                <Table.Th>
                  <VisuallyHidden>Actions</VisuallyHidden>
                </Table.Th>
              )}
            </Table.Tr>
          </Table.Thead>
          <Table.Tbody>
            {shown.length === 0 && (
              <Table.Tr>
                <Table.Td colSpan={columns.length + (hasActions ? 1 : 0)}>
                  <Text c="dimmed" size="sm" ta="center" py="md">
                    {rows.length === 0 ? emptyLabel : 'No rows match the search or filter.'}
                  </Text>
                </Table.Td>
              </Table.Tr>
            )}
            {shown.map(({ row, index }) => {
              const name = rowLabel(row, index);
              return (
                <Table.Tr key={index}>
                  {columns.map((column) => {
                    const error = cellError?.(index, column.key);
                    return (
                      <Table.Td
                        key={column.key}
                        style={{ textAlign: column.align, verticalAlign: 'top' }}
                      >
                        {column.editor && editing ? (
                          <EditableCell
                            row={row}
                            editor={column.editor}
                            label={`${column.header} for ${name}`}
                            error={error}
                            onChange={(changed) => onRowChange(index, changed)}
                          />
                        ) : (
                          <>
                            {column.render
                              ? column.render(row, index)
                              : column.editor && readOnlyValue(column.editor, row)}
                            {error && (
                              <Text c="red" size="xs" role="alert">
                                {error}
                              </Text>
                            )}
                          </>
                        )}
                      </Table.Td>
                    );
                  })}
                  {hasActions && (
                    <Table.Td style={{ verticalAlign: 'top' }}>
                      <Group gap={4} wrap="nowrap" justify="flex-end">
                        {rowActions?.(row, index)}
                        {!readOnly && onDelete && (
                          <Tooltip label="Delete">
                            <ActionIcon
                              variant="subtle"
                              color="red"
                              aria-label={`Delete ${name}`}
                              onClick={() => onDelete(index)}
                            >
                              <IconTrash size={16} />
                            </ActionIcon>
                          </Tooltip>
                        )}
                      </Group>
                    </Table.Td>
                  )}
                </Table.Tr>
              );
            })}
          </Table.Tbody>
        </Table>
      </Table.ScrollContainer>
      <Group justify="space-between" mt="sm">
        <Text size="xs" c="dimmed">
          {visible.length === rows.length
            ? `${rows.length} ${rows.length === 1 ? 'row' : 'rows'}`
            : `${visible.length} of ${rows.length} rows`}
        </Text>
        {pages > 1 && (
          <Pagination
            size="sm"
            total={pages}
            value={currentPage}
            onChange={setPage}
            getControlProps={(control) => ({
              'aria-label': control === 'previous' ? 'Previous page' : 'Next page',
            })}
            getItemProps={(item) => ({ 'aria-label': `Page ${item}` })}
          />
        )}
      </Group>
    </>
  );
}
