import { Group, Paper, Table, Text } from '@mantine/core';
import type { Takeoff } from '@pondwright/shared/engine';
import { formatQuantity, show } from '../utils/format-quantity';
import { laborRows } from '../utils/key-figures';
import { ExplainButton } from './figure-card';

export function LaborCard({ takeoff }: { takeoff: Takeoff }) {
  const { labor, unitSystem } = takeoff;
  const crewDays = takeoff.explanations.find((e) => e.figure === 'labor.crewDays');
  return (
    <Paper p="sm" component="article" aria-label="Labor">
      <Group justify="space-between" align="flex-end" mb="xs">
        <div>
          <Group gap={4} wrap="nowrap">
            <Text size="xs" c="dimmed" fw={500}>
              Crew-days
            </Text>
            {crewDays && <ExplainButton label="Crew-days" explanation={crewDays} />}
          </Group>
          <Text fw={600} fz="lg" lh={1.3}>
            {crewDays ? formatQuantity(crewDays.display) : show(labor.crewDays, 'day', unitSystem)}
          </Text>
        </div>
        <Text size="xs" c="dimmed" ta="right">
          {show(labor.totalLaborHours, 'hour', unitSystem)} of labor, crew of {labor.crewSize} ×{' '}
          {show(labor.hoursPerDay, 'hour', unitSystem)} days
        </Text>
      </Group>
      <Table fz="sm" verticalSpacing={2} highlightOnHover={false} aria-label="Labor-hours by task">
        <Table.Tbody>
          {laborRows(takeoff).map((row) => (
            <Table.Tr key={row.key}>
              <Table.Td>{row.label}</Table.Td>
              <Table.Td ta="right" style={{ whiteSpace: 'nowrap' }}>
                {row.value}
              </Table.Td>
              <Table.Td w={32}>
                {row.explanation && (
                  <ExplainButton label={`Labor, ${row.label}`} explanation={row.explanation} />
                )}
              </Table.Td>
            </Table.Tr>
          ))}
        </Table.Tbody>
      </Table>
    </Paper>
  );
}
