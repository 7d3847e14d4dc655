import { Skeleton, Stack, Title } from '@mantine/core';
import { ErrorPanel } from '@/components/error-panel';
import { useCustomer } from '../api/get-customer';
import { CustomerDetails } from './customer-details';
import { SitesList } from './sites-list';

type CustomerViewProps = { id: string; canEdit: boolean; onDeleted: () => void };

/** One customer's page: details, then sites, with loading and error states. */
export function CustomerView({ id, canEdit, onDeleted }: CustomerViewProps) {
  const customer = useCustomer(id);
  if (customer.isPending) {
    return (
      <Stack aria-busy="true" aria-label="Loading customer">
        <Skeleton height={32} width="40%" />
        <Skeleton height={160} />
        <Skeleton height={160} />
      </Stack>
    );
  }
  if (customer.isError) {
    return (
      <ErrorPanel
        title="Could not load this customer"
        error={customer.error}
        onRetry={() => void customer.refetch()}
      />
    );
  }
  return (
    <Stack>
      <Title order={1} fz="h2">
        {customer.data.name}
      </Title>
      <CustomerDetails
        key={customer.data.updatedAt}
        customer={customer.data}
        canEdit={canEdit}
        onDeleted={onDeleted}
      />
      <SitesList customer={customer.data} canEdit={canEdit} />
    </Stack>
  );
}
