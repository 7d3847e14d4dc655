import { Anchor, Button, EmptyState, Table } from '@mantine/core';
import { IconReceipt2, IconRulerMeasure } from '@tabler/icons-react';
import { Link } from 'react-router-dom';
import { ErrorPanel } from '@/components/error-panel';
import { TableSkeleton } from '@/components/table-skeleton';
import { paths } from '@/config/paths';
import { formatDate, formatMoney } from '@/lib/format';
import { usePricedTakeoffs } from '../api/get-priced-takeoffs';

/** Saved, priced takeoffs, newest first. */
export function PricedTakeoffsList() {
  const list = usePricedTakeoffs();
  if (list.isPending) return <TableSkeleton label="Loading priced takeoffs" />;
  if (list.isError) {
    return (
      <ErrorPanel
        title="Could not load the priced takeoffs"
        error={list.error}
        onRetry={() => void list.refetch()}
      />
    );
  }
  if (list.data.length === 0) {
    return (
      <EmptyState
        icon={<IconReceipt2 />}
        title="No priced takeoffs yet"
        description="Measure a water feature on the Takeoff screen and choose “Save and price”."
      >
        <EmptyState.Actions>
          <Button
            component={Link}
            to={paths.takeoff.getHref()}
            variant="light"
            leftSection={<IconRulerMeasure size={16} />}
          >
            Open the takeoff
          </Button>
        </EmptyState.Actions>
      </EmptyState>
    );
  }
  return (
    <Table.ScrollContainer minWidth={600}>
      <Table aria-label="Priced takeoffs">
        <Table.Thead>
          <Table.Tr>
            <Table.Th>Name</Table.Th>
            <Table.Th ta="right">Total</Table.Th>
            <Table.Th>Price book</Table.Th>
            <Table.Th>Saved</Table.Th>
          </Table.Tr>
        </Table.Thead>
        <Table.Tbody>
          {list.data.map((item) => (
            <Table.Tr key={item.id}>
              <Table.Td>
                <Anchor component={Link} to={paths.pricedTakeoff.getHref(item.id)} fw={500}>
                  {item.name}
                </Anchor>
              </Table.Td>
              <Table.Td ta="right" ff="monospace">
                {formatMoney(item.total)}
              </Table.Td>
              <Table.Td>Version {item.versionNumber}</Table.Td>
              <Table.Td>{formatDate(item.createdAt)}</Table.Td>
            </Table.Tr>
          ))}
        </Table.Tbody>
      </Table>
    </Table.ScrollContainer>
  );
}
