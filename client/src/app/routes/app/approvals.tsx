import { Paper } from '@mantine/core';
import { PageHeader } from '@/components/page-header';
import { paths } from '@/config/paths';
import { ApprovalQueue } from '@/features/approvals/components/approval-queue';
import { RequireRole } from '@/features/auth/components/require-role';

export function ApprovalsRoute() {
  return (
    <RequireRole area="approvals" areaName="the approval queue">
      <PageHeader
        title="Approvals"
        description="Estimates below the margin floor or above the discount ceiling wait here until an owner approves them or sends them back."
      />
      <Paper p="md">
        <ApprovalQueue estimateHref={paths.estimate.getHref} />
      </Paper>
    </RequireRole>
  );
}
