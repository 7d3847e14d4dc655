import { Alert, Anchor, Button, Group, List, Skeleton, Stack, Text, Title } from '@mantine/core';
import { IconAlertTriangle, IconDownload } from '@tabler/icons-react';
import type { JobCostReport } from '@pondwright/shared';
import { Link } from 'react-router-dom';
import { ErrorPanel } from '@/components/error-panel';
import { paths } from '@/config/paths';
import { formatMoney } from '@/lib/format';
import { notifyApiError } from '@/lib/notify';
import { useDownloadJobReport } from '../api/download-job-report';
import { useJobReport } from '../api/get-job-report';
import { ReportChart } from './report-chart';
import { MaterialsTable, OtherCostsTable, QuantityTable } from './report-quantities';
import { CategoriesTable, LaborTable, PeopleTable, ScheduleDaysTable } from './report-sections';
import { ReportTotals } from './report-totals';

function ReportBody({ report }: { report: JobCostReport }) {
  const money = (amount: string) => formatMoney(amount, report.currency);
  return (
    <Stack gap="md">
      {report.warnings.length > 0 && (
        <Alert
          color="clay"
          variant="light"
          icon={<IconAlertTriangle />}
          title="Read these figures with care"
        >
          <List size="sm">
            {report.warnings.map((warning, index) => (
              <List.Item key={index}>{warning}</List.Item>
            ))}
          </List>
        </Alert>
      )}
      <ReportTotals report={report} />
      <ReportChart report={report} />
      <CategoriesTable report={report} money={money} />
      <LaborTable report={report} money={money} />
      <PeopleTable report={report} />
      <MaterialsTable report={report} money={money} />
      <QuantityTable
        title="Equipment"
        rows={report.equipment}
        money={money}
        empty="No equipment in the budget or the logs."
      />
      <QuantityTable
        title="Disposal"
        rows={report.disposal}
        money={money}
        empty="No disposal in the budget or the logs."
      />
      <OtherCostsTable report={report} money={money} />
      <ScheduleDaysTable report={report} />
      {report.notes.length > 0 && (
        <section aria-label="Notes">
          <List size="sm" c="dimmed">
            {report.notes.map((note, index) => (
              <List.Item key={index}>{note}</List.Item>
            ))}
          </List>
        </section>
      )}
    </Stack>
  );
}

type JobReportProps = { job: { id: string; number: number } };

/** The budget set against the crew's logs, and the CSV of the same lines for a spreadsheet. */
export function JobReport({ job }: JobReportProps) {
  const report = useJobReport(job.id);
  const download = useDownloadJobReport();

  return (
    <Stack gap="md">
      <Group justify="space-between" align="flex-start">
        <Stack gap={2}>
          <Title order={2} fz="h4">
            Job cost report
          </Title>
          <Text size="sm" c="dimmed">
            The budget from the accepted quote against what the daily logs recorded. Closed jobs
            teach the{' '}
            <Anchor component={Link} to={paths.learnedRates.getHref()} inherit>
              crew rates
            </Anchor>
            .
          </Text>
        </Stack>
        <Button
          variant="default"
          leftSection={<IconDownload size={16} />}
          loading={download.isPending}
          onClick={() =>
            download.mutate(job, {
              onError: (error) => notifyApiError(error, 'Could not download the report'),
            })
          }
        >
          Download CSV
        </Button>
      </Group>
      {report.isPending ? (
        <Stack gap="xs" aria-label="Loading the report">
          <Skeleton height={80} />
          <Skeleton height={200} />
        </Stack>
      ) : report.isError ? (
        <ErrorPanel
          title="Could not load the report"
          error={report.error}
          onRetry={() => void report.refetch()}
        />
      ) : (
        <ReportBody report={report.data} />
      )}
    </Stack>
  );
}
