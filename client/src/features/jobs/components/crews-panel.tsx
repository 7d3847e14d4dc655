import { Button, Group, Paper, Skeleton, Table, Text, Title } from '@mantine/core';
import { IconPlus } from '@tabler/icons-react';
import { useState } from 'react';
import { ErrorPanel } from '@/components/error-panel';
import { useCrews } from '../api/get-crews';
import { AddCrewModal } from './add-crew-modal';

/** The company's crews and who leads each; owners add crews here. */
export function CrewsPanel() {
  const crews = useCrews();
  const [adding, setAdding] = useState(false);

  return (
    <Paper p="md" component="section" aria-labelledby="crews-title">
      <Group justify="space-between" mb="xs">
        <Title order={2} fz="h5" id="crews-title">
          Crews
        </Title>
        <Button
          size="xs"
          variant="light"
          leftSection={<IconPlus size={14} />}
          onClick={() => setAdding(true)}
        >
          Add crew
        </Button>
      </Group>
      {crews.isError ? (
        <ErrorPanel error={crews.error} onRetry={() => void crews.refetch()} />
      ) : !crews.data ? (
        <Skeleton height={60} />
      ) : crews.data.length === 0 ? (
        <Text size="sm" c="dimmed">
          No crews yet. Add one, then give jobs to it.
        </Text>
      ) : (
        <Table aria-label="Crews" verticalSpacing={4}>
          <Table.Thead>
            <Table.Tr>
              <Table.Th>Crew</Table.Th>
              <Table.Th>Crew lead</Table.Th>
            </Table.Tr>
          </Table.Thead>
          <Table.Tbody>
            {crews.data.map((crew) => (
              <Table.Tr key={crew.id}>
                <Table.Td>{crew.name}</Table.Td>
                <Table.Td>
                  {crew.leadName ?? (
                    <Text span size="sm" c="dimmed">
                      No lead yet
                    </Text>
                  )}
                </Table.Td>
              </Table.Tr>
            ))}
          </Table.Tbody>
        </Table>
      )}
      <AddCrewModal opened={adding} onClose={() => setAdding(false)} />
    </Paper>
  );
}
