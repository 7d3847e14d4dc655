import { Anchor } from '@mantine/core';
import { IconArrowLeft } from '@tabler/icons-react';
import { Link, useNavigate, useParams } from 'react-router-dom';
import { paths } from '@/config/paths';
import { RequireRole } from '@/features/auth/components/require-role';
import { useSignedInUser } from '@/features/auth/hooks/use-signed-in-user';
import { CustomerView } from '@/features/customers/components/customer-view';
import { canAccess } from '@/lib/authorization';

export function CustomerRoute() {
  const { id = '' } = useParams();
  const user = useSignedInUser();
  const navigate = useNavigate();
  return (
    <RequireRole area="customers" areaName="customers">
      <Anchor
        component={Link}
        to={paths.customers.getHref()}
        size="sm"
        mb="sm"
        display="inline-flex"
        style={{ alignItems: 'center', gap: 4 }}
      >
        <IconArrowLeft size={14} /> All customers
      </Anchor>
      <CustomerView
        key={id}
        id={id}
        canEdit={canAccess(user.role, 'customersEdit')}
        onDeleted={() => void navigate(paths.customers.getHref())}
      />
    </RequireRole>
  );
}
