import { Badge, Button, Group, Stack, Text } from '@mantine/core';
import { IconListSearch, IconRefresh } from '@tabler/icons-react';
import { useState } from 'react';
import { ErrorPanel } from '@/components/error-panel';
import { PageHeader } from '@/components/page-header';
import { PageLoader } from '@/components/page-loader';
import { formatDate } from '@/lib/format';
import { notifyApiError, notifySuccess } from '@/lib/notify';
import { usePricedTakeoff } from '../api/get-priced-takeoff';
import { useRepricePricedTakeoff } from '../api/reprice-priced-takeoff';
import { PricedEstimateView } from '@/components/priced-estimate-view';
import { RepricePreviewModal } from './reprice-preview-modal';

/** One priced takeoff: its lines and totals, the book version behind them, and re-pricing. */
export function PricedTakeoffDetail({ id }: { id: string }) {
  const record = usePricedTakeoff(id);
  const reprice = useRepricePricedTakeoff();
  const [previewOpen, setPreviewOpen] = useState(false);

  if (record.isPending) return <PageLoader label="Loading the priced takeoff…" />;
  if (record.isError) {
    return (
      <ErrorPanel
        title="Could not load the priced takeoff"
        error={record.error}
        onRetry={() => void record.refetch()}
      />
    );
  }
  const takeoff = record.data;

  const repriceNow = () =>
    reprice.mutate(id, {
      onSuccess: (updated) => {
        setPreviewOpen(false);
        notifySuccess(
          `Re-priced with version ${updated.priceBookVersion.versionNumber} of the price book.`,
        );
      },
      onError: (error) => notifyApiError(error, 'Could not re-price'),
    });

  return (
    <>
      <PageHeader
        title={takeoff.name}
        description={`Saved ${formatDate(takeoff.createdAt)}${takeoff.createdByName ? ` by ${takeoff.createdByName}` : ''}`}
      />
      <Stack gap="md">
        <Group justify="space-between" gap="sm">
          <Group gap="xs">
            <Badge variant="light">
              Priced with price book version {takeoff.priceBookVersion.versionNumber}
            </Badge>
            {takeoff.repricedAt && (
              <Text size="xs" c="dimmed">
                Re-priced {formatDate(takeoff.repricedAt)}
              </Text>
            )}
          </Group>
          <Group gap="xs">
            <Button
              variant="light"
              leftSection={<IconListSearch size={16} />}
              onClick={() => setPreviewOpen(true)}
            >
              See what re-pricing would change
            </Button>
            <Button
              leftSection={<IconRefresh size={16} />}
              loading={reprice.isPending}
              onClick={repriceNow}
            >
              Re-price with the latest book
            </Button>
          </Group>
        </Group>
        <PricedEstimateView priced={takeoff.priced} />
      </Stack>
      <RepricePreviewModal
        id={id}
        opened={previewOpen}
        repricing={reprice.isPending}
        onReprice={repriceNow}
        onClose={() => setPreviewOpen(false)}
      />
    </>
  );
}
