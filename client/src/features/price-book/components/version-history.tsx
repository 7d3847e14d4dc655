import { Accordion, Badge, EmptyState, Group, Stack, Text } from '@mantine/core';
import { IconHistory } from '@tabler/icons-react';
import { useState } from 'react';
import { ErrorPanel } from '@/components/error-panel';
import { PriceBookChangesTable } from '@/components/price-book-changes-table';
import { TableSkeleton } from '@/components/table-skeleton';
import { formatDate } from '@/lib/format';
import { usePriceBookVersionChanges } from '../api/get-price-book-version-changes';
import { usePriceBookVersions } from '../api/get-price-book-versions';
import type { PriceBookVersionSummary } from '../types';

function VersionChanges({ version }: { version: PriceBookVersionSummary }) {
  const changes = usePriceBookVersionChanges(version.id);
  if (changes.isPending) return <TableSkeleton label="Loading the changes" rows={2} />;
  if (changes.isError) {
    return (
      <ErrorPanel
        title="Could not load the changes"
        error={changes.error}
        onRetry={() => void changes.refetch()}
      />
    );
  }
  if (changes.data.length === 0) {
    return (
      <Text size="sm" c="dimmed">
        {version.versionNumber === 1
          ? 'The first version: the book as it was set up.'
          : 'Nothing changed from the version before.'}
      </Text>
    );
  }
  return (
    <PriceBookChangesTable
      changes={changes.data}
      label={`Changes in version ${version.versionNumber}`}
    />
  );
}

/** Every version of the book, newest first; opening one shows who changed what. */
export function VersionHistory() {
  const versions = usePriceBookVersions();
  const [open, setOpen] = useState<string | null>(null);

  if (versions.isPending) return <TableSkeleton label="Loading the versions" />;
  if (versions.isError) {
    return (
      <ErrorPanel
        title="Could not load the history"
        error={versions.error}
        onRetry={() => void versions.refetch()}
      />
    );
  }
  if (versions.data.length === 0) {
    return (
      <EmptyState
        icon={<IconHistory />}
        title="No versions yet"
        description="Each save of the book or the policy appears here."
      />
    );
  }

  return (
    <Accordion variant="separated" value={open} onChange={setOpen} aria-label="Versions">
      {versions.data.map((version) => (
        <Accordion.Item key={version.id} value={version.id}>
          <Accordion.Control>
            <Group justify="space-between" wrap="nowrap" gap="sm">
              <Stack gap={2}>
                <Group gap="xs">
                  <Text fw={600} size="sm">
                    Version {version.versionNumber}
                  </Text>
                  {version.status === 'current' && (
                    <Badge size="xs" variant="light">
                      In effect
                    </Badge>
                  )}
                  {version.status === 'scheduled' && (
                    <Badge size="xs" variant="light" color="clay">
                      Scheduled
                    </Badge>
                  )}
                </Group>
                <Text size="xs" c="dimmed">
                  Effective {formatDate(`${version.effectiveDate}T12:00:00`)} · by{' '}
                  {version.authorName} · saved {formatDate(version.createdAt)}
                </Text>
                {version.note && <Text size="sm">{version.note}</Text>}
              </Stack>
              <Badge variant="outline" color="stone" style={{ flexShrink: 0 }}>
                {version.changeCount === 1 ? '1 change' : `${version.changeCount} changes`}
              </Badge>
            </Group>
          </Accordion.Control>
          <Accordion.Panel>
            {open === version.id && <VersionChanges version={version} />}
          </Accordion.Panel>
        </Accordion.Item>
      ))}
    </Accordion>
  );
}
