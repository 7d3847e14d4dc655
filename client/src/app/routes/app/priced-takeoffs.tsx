import { Paper } from '@mantine/core';
import { PageHeader } from '@/components/page-header';
import { RequireRole } from '@/features/auth/components/require-role';
import { PricedTakeoffsList } from '@/features/priced-takeoffs/components/priced-takeoffs-list';

export function PricedTakeoffsRoute() {
  return (
    <RequireRole area="pricedTakeoffs" areaName="priced takeoffs">
      <PageHeader
        title="Priced takeoffs"
        description="Takeoffs saved with their price, each from the price-book version it was priced with."
      />
      <Paper p="md">
        <PricedTakeoffsList />
      </Paper>
    </RequireRole>
  );
}
