import { Box, Button, Group, Paper, Skeleton, Text, Title } from '@mantine/core';
import { IconChevronLeft, IconChevronRight } from '@tabler/icons-react';
import { useSearchParams } from 'react-router-dom';
import { ErrorPanel } from '@/components/error-panel';
import { todayIsoDate } from '@/lib/format';
import { useCrews } from '../api/get-crews';
import { useJobs } from '../api/get-jobs';
import { scheduleRows } from '../utils/schedule-rows';
import {
  addDays,
  formatDayRange,
  formatWeekday,
  isIsoDate,
  mondayOf,
  workWeek,
} from '../utils/week';
import { ScheduleBarLink } from './schedule-bar';

const LABEL_WIDTH = 140;
const GRID = `${LABEL_WIDTH}px repeat(5, minmax(96px, 1fr))`;

/** The week shown: `?week=` (any day of it) so a week can be linked to, else this week. */
function useWeek(): [string, (monday: string) => void] {
  const [params, setParams] = useSearchParams();
  const asked = params.get('week');
  const monday = mondayOf(isIsoDate(asked) ? asked : todayIsoDate());
  const setMonday = (next: string) =>
    setParams(
      (current) => {
        const updated = new URLSearchParams(current);
        updated.set('week', next);
        return updated;
      },
      { replace: true },
    );
  return [monday, setMonday];
}

/** Monday to Friday, a row per crew and one for jobs without a crew, each job a bar across its days. */
export function JobSchedule({ jobHref }: { jobHref: (id: string) => string }) {
  const [monday, setMonday] = useWeek();
  const days = workWeek(monday);
  const friday = days[4] as string;
  const today = todayIsoDate();
  const crews = useCrews();
  const jobs = useJobs({ from: monday, to: friday });
  const rows = scheduleRows(crews.data ?? [], jobs.data ?? [], monday);
  const error = jobs.error ?? crews.error;

  return (
    <Paper p="md" component="section" aria-labelledby="schedule-week-title">
      <Group justify="space-between" mb="md" wrap="wrap" gap="sm">
        <Title order={2} fz="h4" id="schedule-week-title" aria-live="polite">
          Week of {formatDayRange(monday, friday)}
        </Title>
        <Group gap="xs">
          <Button
            variant="default"
            size="xs"
            leftSection={<IconChevronLeft size={14} />}
            onClick={() => setMonday(addDays(monday, -7))}
          >
            Previous week
          </Button>
          <Button variant="subtle" size="xs" onClick={() => setMonday(mondayOf(today))}>
            This week
          </Button>
          <Button
            variant="default"
            size="xs"
            rightSection={<IconChevronRight size={14} />}
            onClick={() => setMonday(addDays(monday, 7))}
          >
            Next week
          </Button>
        </Group>
      </Group>
      {error ? (
        <ErrorPanel
          title="Could not load the schedule"
          error={error}
          onRetry={() => void Promise.all([jobs.refetch(), crews.refetch()])}
        />
      ) : (
        <Box style={{ overflowX: 'auto' }}>
          <Box miw={LABEL_WIDTH + 5 * 96} aria-busy={jobs.isFetching}>
            <Box style={{ display: 'grid', gridTemplateColumns: GRID, gap: 4 }} mb={4}>
              <span />
              {days.map((day) => (
                <Text
                  key={day}
                  size="xs"
                  fw={day === today ? 700 : 500}
                  c={day === today ? undefined : 'dimmed'}
                  ta="center"
                >
                  {formatWeekday(day)}
                </Text>
              ))}
            </Box>
            {!jobs.data ? (
              <Skeleton height={120} />
            ) : (
              rows.map((row) => (
                <Box
                  key={row.key}
                  component="section"
                  aria-label={row.crewName}
                  py={6}
                  style={{
                    display: 'grid',
                    gridTemplateColumns: GRID,
                    gap: 4,
                    borderTop: '1px solid var(--mantine-color-default-border)',
                  }}
                >
                  <Text size="sm" fw={500} c={row.crewless ? 'dimmed' : undefined} truncate>
                    {row.crewName}
                  </Text>
                  {/* Bars are packed into as few lines as fit; a free day stays empty. */}
                  <Box
                    style={{
                      gridColumn: '2 / span 5',
                      display: 'grid',
                      gridTemplateColumns: 'repeat(5, minmax(0, 1fr))',
                      gridAutoFlow: 'row dense',
                      gap: 4,
                      minHeight: 36,
                    }}
                  >
                    {row.bars.map((bar) => (
                      <ScheduleBarLink key={bar.job.id} bar={bar} href={jobHref(bar.job.id)} />
                    ))}
                  </Box>
                </Box>
              ))
            )}
          </Box>
        </Box>
      )}
    </Paper>
  );
}
