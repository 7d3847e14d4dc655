import { Badge, Button, Card, Group, Paper, SimpleGrid, Stack, Text, Title } from '@mantine/core';
import type { CustomerDetail, SiteView } from '@pondwright/shared';
import { IconEdit, IconPlus, IconTrash } from '@tabler/icons-react';
import { useState } from 'react';
import { ConfirmDialog } from '@/components/confirm-dialog';
import { notifySuccess } from '@/lib/notify';
import { useDeleteSite } from '../api/delete-site';
import { SiteForm } from './site-form';

type SitesListProps = { customer: CustomerDetail; canEdit: boolean };

const yesNo = (value: boolean | null) => (value === null ? 'unknown' : value ? 'yes' : 'no');
const measure = (value: number | null, unit: string) =>
  value === null ? 'not recorded' : `${value} ${unit}`;

function SiteFacts({ site }: { site: SiteView }) {
  const facts: Array<[string, string]> = [
    ['Access width', measure(site.accessWidthIn, 'in')],
    ['Carry distance', measure(site.carryDistanceFt, 'ft')],
    ['Slope', measure(site.slopePct, '%')],
    ['Soil', site.soil ?? 'not recorded'],
    ['Water', yesNo(site.waterAvailable)],
    ['Power', yesNo(site.powerAvailable)],
  ];
  return (
    <SimpleGrid cols={2} spacing={4} verticalSpacing={2}>
      {facts.map(([label, value]) => (
        <Text key={label} size="sm">
          <Text span c="dimmed" size="sm">
            {label}:
          </Text>{' '}
          {value}
        </Text>
      ))}
    </SimpleGrid>
  );
}

/** The customer's sites, each with what the crew will meet there. */
export function SitesList({ customer, canEdit }: SitesListProps) {
  const [editing, setEditing] = useState<SiteView | 'new' | null>(null);
  const [removing, setRemoving] = useState<SiteView | null>(null);
  const deleteSite = useDeleteSite(customer.id);

  return (
    <Paper p="md">
      <Group justify="space-between" mb="sm">
        <Title order={2} fz="h4">
          Sites
        </Title>
        {canEdit && (
          <Button
            variant="light"
            leftSection={<IconPlus size={16} />}
            onClick={() => setEditing('new')}
          >
            Add site
          </Button>
        )}
      </Group>
      {customer.sites.length === 0 ? (
        <Text c="dimmed" size="sm">
          No sites yet.{canEdit && ' Add where the feature will be built.'}
        </Text>
      ) : (
        <SimpleGrid cols={{ base: 1, md: 2 }}>
          {customer.sites.map((site) => {
            const name = site.label || site.addressLine;
            return (
              <Card key={site.id} component="article" withBorder aria-label={`Site ${name}`}>
                <Stack gap="xs">
                  <Group justify="space-between" align="flex-start">
                    <div>
                      <Text fw={600}>{name}</Text>
                      <Text size="sm" c="dimmed">
                        {[site.addressLine, site.city, site.region, site.postalCode]
                          .filter(Boolean)
                          .join(', ')}
                      </Text>
                    </div>
                    <Badge color={site.utilitiesLocated ? 'reed' : 'yellow'} variant="light">
                      {site.utilitiesLocated ? 'Utilities located' : 'Utilities not located'}
                    </Badge>
                  </Group>
                  <SiteFacts site={site} />
                  {site.notes && <Text size="sm">{site.notes}</Text>}
                  {canEdit && (
                    <Group gap="xs" justify="flex-end">
                      <Button
                        size="xs"
                        variant="subtle"
                        leftSection={<IconEdit size={14} />}
                        onClick={() => setEditing(site)}
                        aria-label={`Edit ${name}`}
                      >
                        Edit
                      </Button>
                      <Button
                        size="xs"
                        variant="subtle"
                        color="red"
                        leftSection={<IconTrash size={14} />}
                        onClick={() => setRemoving(site)}
                        aria-label={`Remove ${name}`}
                      >
                        Remove
                      </Button>
                    </Group>
                  )}
                </Stack>
              </Card>
            );
          })}
        </SimpleGrid>
      )}
      {editing !== null && (
        <SiteForm
          key={editing === 'new' ? 'new' : editing.id}
          customerId={customer.id}
          site={editing === 'new' ? null : editing}
          opened
          onClose={() => setEditing(null)}
        />
      )}
      <ConfirmDialog
        opened={removing !== null}
        title="Remove this site?"
        confirmLabel="Remove site"
        confirmColor="red"
        loading={deleteSite.isPending}
        error={deleteSite.error}
        onCancel={() => setRemoving(null)}
        onConfirm={() =>
          removing &&
          deleteSite.mutate(removing.id, {
            onSuccess: () => {
              notifySuccess('Site removed');
              setRemoving(null);
            },
          })
        }
      >
        {removing?.label || removing?.addressLine} will be removed from {customer.name}.
      </ConfirmDialog>
    </Paper>
  );
}
