import { Paper } from '@mantine/core';
import { useState } from 'react';
import { useNavigate } from 'react-router-dom';
import { PageHeader } from '@/components/page-header';
import { paths } from '@/config/paths';
import { RequireRole } from '@/features/auth/components/require-role';
import { CreateEstimateModal } from '@/features/estimates/components/create-estimate-modal';
import { EstimatesTable } from '@/features/estimates/components/estimates-table';

export function EstimatesRoute() {
  const navigate = useNavigate();
  const [creating, setCreating] = useState(false);
  return (
    <RequireRole area="estimates" areaName="estimates">
      <PageHeader
        title="Estimates"
        description="Drafts being priced, versions waiting for approval, and what was sent to customers."
      />
      <Paper p="md">
        <EstimatesTable estimateHref={paths.estimate.getHref} onCreate={() => setCreating(true)} />
      </Paper>
      <CreateEstimateModal
        opened={creating}
        onClose={() => setCreating(false)}
        onCreated={(estimate) => void navigate(paths.estimate.getHref(estimate.id))}
      />
    </RequireRole>
  );
}
