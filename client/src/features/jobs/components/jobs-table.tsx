import { Anchor, Group, Select, Table, Text } from '@mantine/core';
import { JOB_STATUSES, type JobStatus } from '@pondwright/shared';
import { useState } from 'react';
import { Link } from 'react-router-dom';
import { ErrorPanel } from '@/components/error-panel';
import { TableStatusRows } from '@/components/table-status-rows';
import { useJobs } from '../api/get-jobs';
import { JOB_STATUS_LABELS, JobStatusBadge } from './job-status-badge';
import { PlannedDays } from './planned-days';

const STATUS_OPTIONS = JOB_STATUSES.map((status) => ({
  value: status,
  label: JOB_STATUS_LABELS[status],
}));

type JobsTableProps = { jobHref: (id: string) => string };

/** Every job of the company, newest plans first as the server sends them, filtered by status. */
export function JobsTable({ jobHref }: JobsTableProps) {
  const [status, setStatus] = useState<JobStatus | null>(null);
  const jobs = useJobs({ status });
  const data = jobs.data;

  return (
    <>
      <Group mb="sm" gap="sm">
        <Select
          w={200}
          aria-label="Status"
          placeholder="Any status"
          data={STATUS_OPTIONS}
          value={status}
          clearable
          onChange={(value) => setStatus(value as JobStatus | null)}
        />
      </Group>
      {jobs.isError ? (
        <ErrorPanel
          title="Could not load the jobs"
          error={jobs.error}
          onRetry={() => void jobs.refetch()}
        />
      ) : (
        <Table.ScrollContainer minWidth={820}>
          <Table aria-label="Jobs" aria-busy={jobs.isFetching}>
            <Table.Thead>
              <Table.Tr>
                <Table.Th>No.</Table.Th>
                <Table.Th>Title</Table.Th>
                <Table.Th>Customer</Table.Th>
                <Table.Th>Crew</Table.Th>
                <Table.Th>Status</Table.Th>
                <Table.Th>Planned</Table.Th>
              </Table.Tr>
            </Table.Thead>
            <Table.Tbody>
              <TableStatusRows
                columns={6}
                loading={!data}
                empty={data?.length === 0}
                emptyMessage={
                  status
                    ? `No jobs are ${JOB_STATUS_LABELS[status].toLowerCase()}.`
                    : 'No jobs yet. An accepted estimate becomes a job from its page.'
                }
              />
              {data?.map((job) => (
                <Table.Tr key={job.id}>
                  <Table.Td ff="monospace">#{job.number}</Table.Td>
                  <Table.Td>
                    <Anchor component={Link} to={jobHref(job.id)} fw={500}>
                      {job.title}
                    </Anchor>
                  </Table.Td>
                  <Table.Td>{job.customerName}</Table.Td>
                  <Table.Td>
                    {job.crewName ?? (
                      <Text span size="sm" c="dimmed">
                        No crew
                      </Text>
                    )}
                  </Table.Td>
                  <Table.Td>
                    <JobStatusBadge status={job.status} />
                  </Table.Td>
                  <Table.Td>
                    <PlannedDays job={job} />
                  </Table.Td>
                </Table.Tr>
              ))}
            </Table.Tbody>
          </Table>
        </Table.ScrollContainer>
      )}
      {data && (
        <Text size="xs" c="dimmed" mt="sm">
          {data.length === 1 ? '1 job' : `${data.length} jobs`}
        </Text>
      )}
    </>
  );
}
