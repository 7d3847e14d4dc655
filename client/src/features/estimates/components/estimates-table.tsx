import { Anchor, Button, Group, Pagination, Select, Table, Text, TextInput } from '@mantine/core';
import { useDebouncedValue } from '@mantine/hooks';
import { ESTIMATE_STATUSES, type EstimateStatus } from '@pondwright/shared';
import { IconPlus, IconSearch } from '@tabler/icons-react';
import { useState } from 'react';
import { Link } from 'react-router-dom';
import { ErrorPanel } from '@/components/error-panel';
import { TableStatusRows } from '@/components/table-status-rows';
import { formatDate, formatMoney, formatPercent } from '@/lib/format';
import { useEstimates } from '../api/get-estimates';
import { ESTIMATE_STATUS_LABELS, EstimateStatusBadge } from './estimate-status-badge';

export const ESTIMATE_SEARCH_DELAY_MS = 300;
const PAGE_SIZE = 25;
const STATUS_OPTIONS = ESTIMATE_STATUSES.map((status) => ({
  value: status,
  label: ESTIMATE_STATUS_LABELS[status],
}));

type EstimatesTableProps = {
  estimateHref: (id: string) => string;
  onCreate?: () => void;
};

/** The company's estimates, filtered, searched and paged by the server. */
export function EstimatesTable({ estimateHref, onCreate }: EstimatesTableProps) {
  const [search, setSearch] = useState('');
  const [q] = useDebouncedValue(search, ESTIMATE_SEARCH_DELAY_MS);
  const [status, setStatus] = useState<EstimateStatus | null>(null);
  const [page, setPage] = useState(1);
  const estimates = useEstimates({ status, q, page, pageSize: PAGE_SIZE });
  const data = estimates.data;
  const pages = data ? Math.max(1, Math.ceil(data.total / data.pageSize)) : 1;
  const filtered = q.trim() !== '' || status !== null;

  return (
    <>
      <Group justify="space-between" mb="sm" gap="sm">
        <Group gap="sm">
          <TextInput
            w={280}
            leftSection={<IconSearch size={16} />}
            placeholder="Title, customer or number"
            aria-label="Search estimates"
            value={search}
            onChange={(event) => {
              setSearch(event.currentTarget.value);
              setPage(1);
            }}
          />
          <Select
            w={200}
            aria-label="Status"
            placeholder="Any status"
            data={STATUS_OPTIONS}
            value={status}
            clearable
            onChange={(value) => {
              setStatus(value as EstimateStatus | null);
              setPage(1);
            }}
          />
        </Group>
        {onCreate && (
          <Button leftSection={<IconPlus size={16} />} onClick={onCreate}>
            New estimate
          </Button>
        )}
      </Group>
      {estimates.isError ? (
        <ErrorPanel
          title="Could not load estimates"
          error={estimates.error}
          onRetry={() => void estimates.refetch()}
        />
      ) : (
        <Table.ScrollContainer minWidth={820}>
          <Table aria-label="Estimates" aria-busy={estimates.isFetching}>
            <Table.Thead>
              <Table.Tr>
                <Table.Th>No.</Table.Th>
                <Table.Th>Title</Table.Th>
                <Table.Th>Customer</Table.Th>
                <Table.Th>Status</Table.Th>
                <Table.Th ta="right">Total</Table.Th>
                <Table.Th ta="right">Margin</Table.Th>
                <Table.Th>Updated</Table.Th>
              </Table.Tr>
            </Table.Thead>
            <Table.Tbody>
              <TableStatusRows
                columns={7}
                loading={!data}
                empty={data?.items.length === 0}
                emptyMessage={
                  filtered
                    ? 'No estimates match the search or status.'
                    : 'No estimates yet. Start one for a customer.'
                }
              />
              {data?.items.map((estimate) => (
                <Table.Tr key={estimate.id}>
                  <Table.Td ff="monospace">#{estimate.number}</Table.Td>
                  <Table.Td>
                    <Anchor component={Link} to={estimateHref(estimate.id)} fw={500}>
                      {estimate.title}
                    </Anchor>
                  </Table.Td>
                  <Table.Td>{estimate.customerName}</Table.Td>
                  <Table.Td>
                    <EstimateStatusBadge status={estimate.status} />
                  </Table.Td>
                  <Table.Td ta="right" ff="monospace">
                    {formatMoney(estimate.total)}
                  </Table.Td>
                  <Table.Td ta="right">
                    {estimate.grossMarginPct === null
                      ? '—'
                      : formatPercent(estimate.grossMarginPct)}
                  </Table.Td>
                  <Table.Td>{formatDate(estimate.updatedAt)}</Table.Td>
                </Table.Tr>
              ))}
            </Table.Tbody>
          </Table>
        </Table.ScrollContainer>
      )}
      {data && (
        <Group justify="space-between" mt="sm">
          <Text size="xs" c="dimmed">
            {data.total === 1 ? '1 estimate' : `${data.total} estimates`}
          </Text>
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
