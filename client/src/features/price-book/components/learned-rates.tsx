import { Button, Skeleton, Stack, Table, Text } from '@mantine/core';
import type { LearnedRate } from '@pondwright/shared';
import { IconBookUpload } from '@tabler/icons-react';
import { useState } from 'react';
import { ConfirmDialog } from '@/components/confirm-dialog';
import { ErrorPanel } from '@/components/error-panel';
import { notifySuccess } from '@/lib/notify';
import { useAdoptLearnedRate } from '../api/adopt-learned-rate';
import { useLearnedRates } from '../api/get-learned-rates';
import { formatHoursRatio, formatRate } from '../utils/learned-rate-format';

type LearnedRatesProps = {
  /** Owners put a learned rate into the price book; estimators read the table. */
  canAdopt: boolean;
};

function HoursCell({ rate }: { rate: LearnedRate }) {
  if (rate.hoursRatio === null) return <Text size="sm">—</Text>;
  const more = rate.hoursRatio > 1;
  return (
    <Stack gap={0}>
      <Text size="sm" fw={500} c={more ? 'red.7' : rate.hoursRatio < 1 ? 'reed.7' : undefined}>
        {formatHoursRatio(rate.hoursRatio)}
      </Text>
      <Text size="xs" c="dimmed">
        {rate.actualHours} h logged, {rate.estimatedHours} h quoted
      </Text>
    </Stack>
  );
}

function RatesTable({
  rates,
  canAdopt,
  onAdopt,
}: {
  rates: LearnedRate[];
  canAdopt: boolean;
  onAdopt: (rate: LearnedRate) => void;
}) {
  return (
    <Table.ScrollContainer minWidth={860}>
      <Table aria-label="Crew rates" verticalSpacing={8}>
        <Table.Thead>
          <Table.Tr>
            <Table.Th>Rate</Table.Th>
            <Table.Th>Price book</Table.Th>
            <Table.Th>Crews’ rate</Table.Th>
            <Table.Th>Hours against the quote</Table.Th>
            <Table.Th ta="right">Closed jobs</Table.Th>
            {canAdopt && <Table.Th />}
          </Table.Tr>
        </Table.Thead>
        <Table.Tbody>
          {rates.map((rate) => {
            const learned = rate.learnedValue;
            return (
              <Table.Tr key={rate.parameter}>
                <Table.Td fw={500}>{rate.label}</Table.Td>
                <Table.Td>{formatRate(rate.bookValue, rate.unit)}</Table.Td>
                <Table.Td>
                  {learned === null ? (
                    <Text size="sm" c="dimmed">
                      Not enough data
                    </Text>
                  ) : (
                    formatRate(learned, rate.unit)
                  )}
                </Table.Td>
                <Table.Td>
                  <HoursCell rate={rate} />
                </Table.Td>
                <Table.Td ta="right">{rate.jobs}</Table.Td>
                {canAdopt && (
                  <Table.Td>
                    {learned !== null && learned !== rate.bookValue && (
                      <Button
                        size="xs"
                        variant="light"
                        leftSection={<IconBookUpload size={14} />}
                        onClick={() => onAdopt(rate)}
                      >
                        Use in the price book
                      </Button>
                    )}
                  </Table.Td>
                )}
              </Table.Tr>
            );
          })}
        </Table.Tbody>
      </Table>
    </Table.ScrollContainer>
  );
}

/**
 * The price book's production rates beside what the crews achieved on closed jobs, learned from the
 * hours logged for each task against the hours quoted; an owner can put a learned rate in the book.
 */
export function LearnedRates({ canAdopt }: LearnedRatesProps) {
  const rates = useLearnedRates();
  const adopt = useAdoptLearnedRate();
  const [adopting, setAdopting] = useState<LearnedRate | null>(null);

  if (rates.isPending) return <Skeleton height={240} aria-label="Loading the crew rates" />;
  if (rates.isError) {
    return (
      <ErrorPanel
        title="Could not load the crew rates"
        error={rates.error}
        onRetry={() => void rates.refetch()}
      />
    );
  }
  const learned = adopting?.learnedValue ?? null;

  return (
    <Stack gap="md">
      <Text size="sm" c="dimmed">
        Each rate is learned from the hours the daily logs recorded for its task on closed jobs,
        against the hours the quotes planned. The more jobs behind a rate, the more it can be
        trusted.
      </Text>
      <RatesTable
        rates={rates.data}
        canAdopt={canAdopt}
        onAdopt={(rate) => {
          adopt.reset();
          setAdopting(rate);
        }}
      />
      {canAdopt && (
        <ConfirmDialog
          opened={adopting !== null}
          title="Use the crews’ rate in the price book?"
          confirmLabel="Use in the price book"
          loading={adopt.isPending}
          error={adopt.error}
          onCancel={() => setAdopting(null)}
          onConfirm={() =>
            adopting &&
            adopt.mutate(
              { parameter: adopting.parameter },
              {
                onSuccess: (version) => {
                  notifySuccess(
                    `${adopting.label} is now ${formatRate(learned ?? 0, adopting.unit)} in version ${version.versionNumber} of the price book.`,
                    'Price book updated',
                  );
                  setAdopting(null);
                },
              },
            )
          }
        >
          {adopting && learned !== null && (
            <>
              <b>{adopting.label}</b> changes from {formatRate(adopting.bookValue, adopting.unit)}{' '}
              to {formatRate(learned, adopting.unit)}, learned from {adopting.jobs} closed{' '}
              {adopting.jobs === 1 ? 'job' : 'jobs'}. The price book gets a new version, in use from
              today; estimates already made keep their prices.
            </>
          )}
        </ConfirmDialog>
      )}
    </Stack>
  );
}
