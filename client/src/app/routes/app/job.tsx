import { Anchor } from '@mantine/core';
import { IconArrowLeft } from '@tabler/icons-react';
import { Link, useParams } from 'react-router-dom';
import { paths } from '@/config/paths';
import { RequireRole } from '@/features/auth/components/require-role';
import { useSignedInUser } from '@/features/auth/hooks/use-signed-in-user';
import { JobPage } from '@/features/jobs/components/job-page';
import { canAccess } from '@/lib/authorization';

function JobRoutePage({ id }: { id: string }) {
  const { role } = useSignedInUser();
  return (
    <JobPage
      key={id}
      id={id}
      access={{
        money: canAccess(role, 'jobsMoney'),
        schedule: canAccess(role, 'jobsSchedule'),
        close: canAccess(role, 'jobsClose'),
      }}
      logHref={paths.jobLog.getHref}
    />
  );
}

export function JobRoute() {
  const { id = '' } = useParams();
  return (
    <RequireRole area="jobs" areaName="jobs">
      <Anchor
        component={Link}
        to={paths.jobs.getHref()}
        size="sm"
        mb="sm"
        display="inline-flex"
        style={{ alignItems: 'center', gap: 4 }}
      >
        <IconArrowLeft size={14} /> All jobs
      </Anchor>
      <JobRoutePage id={id} />
    </RequireRole>
  );
}
