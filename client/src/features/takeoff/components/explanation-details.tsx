import { Code, Stack, Table, Text } from '@mantine/core';
import type { Explanation } from '@pondwright/shared/engine';

function Part({ title, children }: { title: string; children: React.ReactNode }) {
  return (
    <div>
      <Text size="xs" fw={600} c="dimmed" tt="uppercase" mb={2}>
        {title}
      </Text>
      {children}
    </div>
  );
}

/** One figure's formula, the numbers put into it, its rounding and where its constants come from. */
export function ExplanationDetails({ explanation }: { explanation: Explanation }) {
  return (
    <Stack gap="sm">
      <Part title="Formula">
        <Code block style={{ whiteSpace: 'pre-wrap' }}>
          {explanation.formula}
        </Code>
      </Part>
      <Part title="Workings">
        <Code block style={{ whiteSpace: 'pre-wrap' }}>
          {explanation.workings}
        </Code>
      </Part>
      <Part title="Rounding">
        <Text size="sm">{explanation.rounding}</Text>
      </Part>
      {explanation.note && (
        <Part title="Note">
          <Text size="sm">{explanation.note}</Text>
        </Part>
      )}
      {explanation.sources.length > 0 && (
        <Part title="Sources">
          <Table fz="xs" verticalSpacing={4} highlightOnHover={false} withRowBorders>
            <Table.Tbody>
              {explanation.sources.map((source) => (
                <Table.Tr key={`${source.name}-${source.value}`}>
                  <Table.Td>{source.name}</Table.Td>
                  <Table.Td style={{ whiteSpace: 'nowrap' }}>{source.value}</Table.Td>
                  <Table.Td c="dimmed">{source.source}</Table.Td>
                </Table.Tr>
              ))}
            </Table.Tbody>
          </Table>
        </Part>
      )}
    </Stack>
  );
}
