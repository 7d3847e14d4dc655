import { Paper } from '@mantine/core';
import { useState } from 'react';
import { useNavigate } from 'react-router-dom';
import { PageHeader } from '@/components/page-header';
import { paths } from '@/config/paths';
import { RequireRole } from '@/features/auth/components/require-role';
import { useSignedInUser } from '@/features/auth/hooks/use-signed-in-user';
import { CreateCustomerModal } from '@/features/customers/components/create-customer-modal';
import { CustomersTable } from '@/features/customers/components/customers-table';
import { canAccess } from '@/lib/authorization';

export function CustomersRoute() {
  const user = useSignedInUser();
  const navigate = useNavigate();
  const [creating, setCreating] = useState(false);
  const canEdit = canAccess(user.role, 'customersEdit');
  return (
    <RequireRole area="customers" areaName="customers">
      <PageHeader
        title="Customers"
        description="The people you quote for, and the sites where their features are built."
      />
      <Paper p="md">
        <CustomersTable
          customerHref={paths.customer.getHref}
          onCreate={canEdit ? () => setCreating(true) : undefined}
        />
      </Paper>
      {canEdit && (
        <CreateCustomerModal
          opened={creating}
          onClose={() => setCreating(false)}
          onCreated={(customer) => void navigate(paths.customer.getHref(customer.id))}
        />
      )}
    </RequireRole>
  );
}
