import { Anchor } from '@mantine/core';
import { IconArrowLeft } from '@tabler/icons-react';
import { Link, useParams } from 'react-router-dom';
import { paths } from '@/config/paths';
import { RequireRole } from '@/features/auth/components/require-role';
import { PricedTakeoffDetail } from '@/features/priced-takeoffs/components/priced-takeoff-detail';

export function PricedTakeoffRoute() {
  const { id = '' } = useParams();
  return (
    <RequireRole area="pricedTakeoffs" areaName="priced takeoffs">
      <Anchor
        component={Link}
        to={paths.pricedTakeoffs.getHref()}
        size="sm"
        mb="sm"
        display="inline-flex"
        style={{ alignItems: 'center', gap: 4 }}
      >
        <IconArrowLeft size={14} /> All priced takeoffs
      </Anchor>
      <PricedTakeoffDetail key={id} id={id} />
    </RequireRole>
  );
}
