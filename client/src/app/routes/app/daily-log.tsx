import { Anchor } from '@mantine/core';
import { IconArrowLeft } from '@tabler/icons-react';
import { Link, Navigate, useNavigate, useParams } from 'react-router-dom';
import { paths } from '@/config/paths';
import { useSignedInUser } from '@/features/auth/hooks/use-signed-in-user';
import { DailyLogPage } from '@/features/daily-log/components/daily-log-page';
import { isIsoDay, todayIsoDate } from '@/features/daily-log/utils/dates';

/** `/jobs/:id/log/:date`, and `/jobs/:id/log`, which opens today's. Every role may write a log. */
export function DailyLogRoute() {
  const { id = '', date } = useParams();
  const user = useSignedInUser();
  const navigate = useNavigate();
  if (!isIsoDay(date)) return <Navigate to={paths.jobLog.getHref(id, todayIsoDate())} replace />;
  // Crew leads come from their list of jobs; the office from the job's own page.
  const crew = user.role === 'crew_lead';
  return (
    <>
      <Anchor
        component={Link}
        to={crew ? paths.myJobs.getHref() : paths.job.getHref(id)}
        size="sm"
        mb="sm"
        display="inline-flex"
        style={{ alignItems: 'center', gap: 4 }}
      >
        <IconArrowLeft size={14} /> {crew ? 'My jobs' : 'The job'}
      </Anchor>
      <DailyLogPage
        key={`${id}.${date}`}
        jobId={id}
        logDate={date}
        userId={user.id}
        onDayChange={(day) => void navigate(paths.jobLog.getHref(id, day))}
      />
    </>
  );
}
