import { Indicator } from '@mantine/core';
import { IconChecklist, type IconProps } from '@tabler/icons-react';
import { useApprovalQueue } from '../api/get-approval-queue';

/** The navigation's Approvals icon, with the number of estimates waiting as its badge. */
export function ApprovalsNavIcon(props: IconProps) {
  const queue = useApprovalQueue();
  const waiting = queue.data?.length ?? 0;
  return (
    <Indicator
      label={waiting}
      disabled={waiting === 0}
      size={16}
      color="clay"
      offset={2}
      aria-label={`${waiting} waiting`}
    >
      <IconChecklist {...props} />
    </Indicator>
  );
}
