import '@mantine/charts/styles.css';
import { LineChart } from '@mantine/charts';
import { ActionIcon, Button, Grid, Group, Paper, Stack, Table, Text } from '@mantine/core';
import type { PumpCurvePoint } from '@pondwright/shared/pricing';
import { IconPlus, IconTrash } from '@tabler/icons-react';
import { NumberTextInput } from '@/components/number-text-input';

type PumpCurveEditorProps = {
  points: PumpCurvePoint[];
  readOnly: boolean;
  /** The error for `index.field`, or for the whole curve when `field` is empty. */
  errorFor: (field: string) => string | undefined;
  onChange: (points: PumpCurvePoint[]) => void;
};

type Field = keyof PumpCurvePoint;
const FIELDS: Array<{ field: Field; header: string }> = [
  { field: 'flowGph', header: 'Flow (gph)' },
  { field: 'headFt', header: 'Head (ft)' },
  { field: 'inputWatts', header: 'Input (W)' },
];

/** The points that read as numbers, by rising flow: what the chart can draw while others are typed. */
export function chartPoints(points: ReadonlyArray<PumpCurvePoint>) {
  return points
    .filter(
      (point) =>
        typeof point.flowGph === 'number' &&
        typeof point.headFt === 'number' &&
        Number.isFinite(point.flowGph) &&
        Number.isFinite(point.headFt),
    )
    .map((point) => ({ flowGph: point.flowGph, headFt: point.headFt }))
    .sort((a, b) => a.flowGph - b.flowGph);
}

/**
 * A pump's catalogue curve: points of flow against head with the input power at each, and
 * the curve drawn beside them (head up the side, flow along the bottom) as they are typed.
 */
export function PumpCurveEditor({ points, readOnly, errorFor, onChange }: PumpCurveEditorProps) {
  const drawn = chartPoints(points);
  const curveError = errorFor('');
  const setPoint = (index: number, field: Field, value: number | string | undefined) =>
    onChange(
      points.map((point, i) =>
        i === index ? ({ ...point, [field]: value } as PumpCurvePoint) : point,
      ),
    );
  const addPoint = () => {
    const last = points.at(-1);
    onChange([
      ...points,
      {
        flowGph: typeof last?.flowGph === 'number' ? last.flowGph + 500 : 0,
        headFt: 0,
        inputWatts: typeof last?.inputWatts === 'number' ? last.inputWatts : 100,
      },
    ]);
  };

  return (
    <Grid gap="md">
      <Grid.Col span={{ base: 12, md: 6 }}>
        <Stack gap="xs">
          <Table aria-label="Pump curve points" verticalSpacing={4}>
            <Table.Thead>
              <Table.Tr>
                <Table.Th>#</Table.Th>
                {FIELDS.map(({ field, header }) => (
                  <Table.Th key={field}>{header}</Table.Th>
                ))}
                {!readOnly && <Table.Th aria-label="Actions" />}
              </Table.Tr>
            </Table.Thead>
            <Table.Tbody>
              {points.map((point, index) => (
                <Table.Tr key={index}>
                  <Table.Td>{index + 1}</Table.Td>
                  {FIELDS.map(({ field, header }) => (
                    <Table.Td key={field}>
                      <NumberTextInput
                        size="xs"
                        aria-label={`${header}, point ${index + 1}`}
                        readOnly={readOnly}
                        value={point[field]}
                        error={errorFor(`${index}.${field}`)}
                        onChange={(value) => setPoint(index, field, value)}
                      />
                    </Table.Td>
                  ))}
                  {!readOnly && (
                    <Table.Td>
                      <ActionIcon
                        variant="subtle"
                        color="red"
                        aria-label={`Remove point ${index + 1}`}
                        onClick={() => onChange(points.filter((_, i) => i !== index))}
                      >
                        <IconTrash size={14} />
                      </ActionIcon>
                    </Table.Td>
                  )}
                </Table.Tr>
              ))}
            </Table.Tbody>
          </Table>
          {curveError && (
            <Text c="red" size="sm" role="alert">
              {curveError}
            </Text>
          )}
          {!readOnly && (
            <Group>
              <Button
                size="xs"
                variant="light"
                leftSection={<IconPlus size={14} />}
                onClick={addPoint}
                disabled={points.length >= 20}
              >
                Add a point
              </Button>
            </Group>
          )}
        </Stack>
      </Grid.Col>
      <Grid.Col span={{ base: 12, md: 6 }}>
        <Paper p="sm" component="figure" m={0} aria-label="Pump curve chart">
          {drawn.length < 2 ? (
            <Text size="sm" c="dimmed" ta="center" py="xl">
              Enter at least two points to draw the curve.
            </Text>
          ) : (
            <LineChart
              h={240}
              data={drawn}
              dataKey="flowGph"
              series={[{ name: 'headFt', label: 'Head (ft)', color: 'reed.7' }]}
              curveType="linear"
              xAxisProps={{ type: 'number', domain: [0, 'dataMax'] }}
              yAxisProps={{ domain: [0, 'dataMax'] }}
              xAxisLabel="Flow (gph)"
              yAxisLabel="Head (ft)"
              withDots
              gridAxis="xy"
            />
          )}
          <Text component="figcaption" size="xs" c="dimmed" mt={4}>
            Head against flow, {drawn.length} {drawn.length === 1 ? 'point' : 'points'} drawn.
          </Text>
        </Paper>
      </Grid.Col>
    </Grid>
  );
}
