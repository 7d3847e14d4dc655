import {
  Anchor,
  Button,
  Group,
  NativeSelect,
  Pagination,
  Table,
  Text,
  TextInput,
  UnstyledButton,
} from '@mantine/core';
import { useDebouncedValue } from '@mantine/hooks';
import type { CustomerSort, SortOrder } from '@pondwright/shared';
import {
  IconArrowsSort,
  IconPlus,
  IconSearch,
  IconSortAscending,
  IconSortDescending,
} from '@tabler/icons-react';
import { useState } from 'react';
import { Link } from 'react-router-dom';
import { ErrorPanel } from '@/components/error-panel';
import { TableStatusRows } from '@/components/table-status-rows';
import { formatDate } from '@/lib/format';
import { useCustomers } from '../api/get-customers';

/** How long typing pauses before the search goes to the server. */
export const SEARCH_DELAY_MS = 300;
const PAGE_SIZES = ['10', '25', '50', '100'];

type CustomersTableProps = {
  customerHref: (id: string) => string;
  /** Shown to those who may add customers. */
  onCreate?: () => void;
};

const SORTABLE: Array<{ key: CustomerSort; header: string }> = [
  { key: 'name', header: 'Name' },
  { key: 'createdAt', header: 'Added' },
  { key: 'updatedAt', header: 'Updated' },
];

/** The company's customers, searched, sorted and paged by the server. */
export function CustomersTable({ customerHref, onCreate }: CustomersTableProps) {
  const [search, setSearch] = useState('');
  const [q] = useDebouncedValue(search, SEARCH_DELAY_MS);
  const [sort, setSort] = useState<{ key: CustomerSort; order: SortOrder }>({
    key: 'name',
    order: 'asc',
  });
  const [page, setPage] = useState(1);
  const [pageSize, setPageSize] = useState(25);
  const customers = useCustomers({ q, sort: sort.key, order: sort.order, page, pageSize });

  const toggleSort = (key: CustomerSort) => {
    setSort((current) =>
      current.key === key
        ? { key, order: current.order === 'asc' ? 'desc' : 'asc' }
        : { key, order: key === 'name' ? 'asc' : 'desc' },
    );
    setPage(1);
  };

  const header = (key: CustomerSort, title: string) => {
    const active = sort.key === key;
    const Icon = !active
      ? IconArrowsSort
      : sort.order === 'asc'
        ? IconSortAscending
        : IconSortDescending;
    return (
      <Table.Th
        key={key}
        aria-sort={active ? (sort.order === 'asc' ? 'ascending' : 'descending') : 'none'}
      >
        <UnstyledButton
          fw={600}
          fz="sm"
          onClick={() => toggleSort(key)}
          aria-label={`Sort by ${title}`}
        >
          <Group gap={4} wrap="nowrap">
            {title}
            <Icon size={14} aria-hidden />
          </Group>
        </UnstyledButton>
      </Table.Th>
    );
  };

  const data = customers.data;
  const pages = data ? Math.max(1, Math.ceil(data.total / data.pageSize)) : 1;
  const searching = q.trim() !== '';

  return (
    <>
      <Group justify="space-between" mb="sm" gap="sm">
        <TextInput
          w={300}
          leftSection={<IconSearch size={16} />}
          placeholder="Name, e-mail or phone"
          aria-label="Search customers"
          value={search}
          onChange={(event) => {
            setSearch(event.currentTarget.value);
            setPage(1);
          }}
        />
        {onCreate && (
          <Button leftSection={<IconPlus size={16} />} onClick={onCreate}>
            New customer
          </Button>
        )}
      </Group>
      {customers.isError ? (
        <ErrorPanel
          title="Could not load customers"
          error={customers.error}
          onRetry={() => void customers.refetch()}
        />
      ) : (
        <Table.ScrollContainer minWidth={640}>
          <Table aria-label="Customers" highlightOnHover aria-busy={customers.isFetching}>
            <Table.Thead>
              <Table.Tr>
                {header('name', 'Name')}
                <Table.Th>Phone</Table.Th>
                <Table.Th>E-mail</Table.Th>
                <Table.Th>Sites</Table.Th>
                {SORTABLE.slice(1).map((column) => header(column.key, column.header))}
              </Table.Tr>
            </Table.Thead>
            <Table.Tbody>
              <TableStatusRows
                columns={6}
                loading={!data}
                empty={data?.items.length === 0}
                emptyMessage={
                  searching
                    ? `No customers match “${q.trim()}”.`
                    : 'No customers yet. Add the first one to start quoting.'
                }
              />
              {data?.items.map((customer) => (
                <Table.Tr key={customer.id}>
                  <Table.Td>
                    <Anchor component={Link} to={customerHref(customer.id)} fw={500}>
                      {customer.name}
                    </Anchor>
                  </Table.Td>
                  <Table.Td>{customer.phone}</Table.Td>
                  <Table.Td>{customer.email}</Table.Td>
                  <Table.Td>{customer.siteCount}</Table.Td>
                  <Table.Td>{formatDate(customer.createdAt)}</Table.Td>
                  <Table.Td>{formatDate(customer.updatedAt)}</Table.Td>
                </Table.Tr>
              ))}
            </Table.Tbody>
          </Table>
        </Table.ScrollContainer>
      )}
      {data && (
        <Group justify="space-between" mt="sm">
          <Group gap="sm">
            <Text size="xs" c="dimmed">
              {data.total === 1 ? '1 customer' : `${data.total} customers`}
            </Text>
            <NativeSelect
              size="xs"
              aria-label="Customers per page"
              data={PAGE_SIZES}
              value={String(pageSize)}
              onChange={(event) => {
                setPageSize(Number(event.currentTarget.value));
                setPage(1);
              }}
            />
          </Group>
          {pages > 1 && (
            <Pagination
              size="sm"
              total={pages}
              value={Math.min(page, pages)}
              onChange={setPage}
              getControlProps={(control) => ({
                'aria-label': control === 'previous' ? 'Previous page' : 'Next page',
              })}
              getItemProps={(item) => ({ 'aria-label': `Page ${item}` })}
            />
          )}
        </Group>
      )}
    </>
  );
}
