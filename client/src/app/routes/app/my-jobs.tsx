import { PageHeader } from '@/components/page-header';
import { useSignedInUser } from '@/features/auth/hooks/use-signed-in-user';
import { CrewJobs } from '@/features/daily-log/components/crew-jobs';

export function MyJobsRoute() {
  const user = useSignedInUser();
  return (
    <>
      <PageHeader title="My jobs" description="Today’s jobs and the ones coming up." />
      <CrewJobs userId={user.id} />
    </>
  );
}
