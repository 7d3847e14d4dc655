import { Group, Input, SegmentedControl, SimpleGrid, Stack, Table, Text } from '@mantine/core';
import { INPUT_LIMITS, type OutlineInput } from '@pondwright/shared/engine';
import { NEW_PART } from '../utils/default-input';
import { measurementUnit } from '../utils/measurement';
import { AddButton, GroupError, PartFieldset, RemoveButton } from './form-parts';
import { MeasurementInput } from './measurement-input';
import { inputId, useTakeoffField } from './takeoff-form-context';

const SHAPES = [
  { value: 'rectangle', label: 'Rectangle' },
  { value: 'oval', label: 'Oval' },
  { value: 'freeform', label: 'Freeform' },
] as const;

const WALL_STYLES = [
  { value: 'vertical', label: 'Vertical' },
  { value: 'battered', label: 'Battered' },
];

const round1 = (value: number) => Math.round(value * 10) / 10;
const numberOr = (value: unknown, fallback: number) =>
  typeof value === 'number' && Number.isFinite(value) ? value : fallback;

/** Keeps the size when the shape changes: a freeform outline starts from the plan it replaces. */
function changeShape(outline: OutlineInput, shape: OutlineInput['shape']): OutlineInput {
  if (shape === outline.shape) return outline;
  let lengthFt: number;
  let widthFt: number;
  if (outline.shape === 'freeform') {
    const xs = outline.pointsFt.map((p) => numberOr(p.xFt, 0));
    const ys = outline.pointsFt.map((p) => numberOr(p.yFt, 0));
    lengthFt = round1(Math.max(...xs) - Math.min(...xs)) || 10;
    widthFt = round1(Math.max(...ys) - Math.min(...ys)) || 8;
  } else {
    lengthFt = numberOr(outline.lengthFt, 10);
    widthFt = numberOr(outline.widthFt, 8);
  }
  if (shape !== 'freeform') return { shape, lengthFt, widthFt };
  if (outline.shape === 'oval') {
    const points = Array.from({ length: 12 }, (_, i) => {
      const t = (2 * Math.PI * i) / 12;
      return {
        xFt: round1((lengthFt / 2) * (1 + Math.cos(t))),
        yFt: round1((widthFt / 2) * (1 + Math.sin(t))),
      };
    });
    return { shape, pointsFt: points };
  }
  return {
    shape,
    pointsFt: [
      { xFt: 0, yFt: 0 },
      { xFt: lengthFt, yFt: 0 },
      { xFt: lengthFt, yFt: widthFt },
      { xFt: 0, yFt: widthFt },
    ],
  };
}

type Point = { xFt: number; yFt: number };

function OutlinePoints({ path, points }: { path: string; points: Point[] }) {
  const { form, system } = useTakeoffField();
  const pointsPath = `${path}.pointsFt`;
  const unit = measurementUnit('ft', system);
  return (
    <Stack gap={4}>
      <Text size="sm" fw={500}>
        Outline points ({unit}), in order around the edge
      </Text>
      <Table withRowBorders={false} verticalSpacing={4} highlightOnHover={false}>
        <Table.Thead>
          <Table.Tr>
            <Table.Th w={40}>#</Table.Th>
            <Table.Th>x ({unit})</Table.Th>
            <Table.Th>y ({unit})</Table.Th>
            <Table.Th w={40} />
          </Table.Tr>
        </Table.Thead>
        <Table.Tbody>
          {points.map((_, k) => (
            <Table.Tr key={k}>
              <Table.Td>
                <Text size="sm" c="dimmed">
                  {k + 1}
                </Text>
              </Table.Td>
              <Table.Td>
                <MeasurementInput
                  size="sm"
                  path={`${pointsPath}.${k}.xFt`}
                  kind="ft"
                  label={null}
                  aria-label={`Point ${k + 1} x (${unit})`}
                />
              </Table.Td>
              <Table.Td>
                <MeasurementInput
                  size="sm"
                  path={`${pointsPath}.${k}.yFt`}
                  kind="ft"
                  label={null}
                  aria-label={`Point ${k + 1} y (${unit})`}
                />
              </Table.Td>
              <Table.Td>
                {points.length > 3 && (
                  <RemoveButton
                    label={`Remove point ${k + 1}`}
                    onClick={() => form.removeListItem(pointsPath, k)}
                  />
                )}
              </Table.Td>
            </Table.Tr>
          ))}
        </Table.Tbody>
      </Table>
      {points.map((_, k) => (
        <GroupError key={k} path={`${pointsPath}.${k}`} />
      ))}
      <GroupError path={pointsPath} />
      <AddButton
        onClick={() => {
          const last = points[points.length - 1];
          form.insertListItem(pointsPath, {
            xFt: numberOr(last?.xFt, 0),
            yFt: numberOr(last?.yFt, 0) + 1,
          });
        }}
        disabled={points.length >= INPUT_LIMITS.outlinePoints}
      >
        Add point
      </AddButton>
    </Stack>
  );
}

type Shelf = { widthIn: number; depthIn: number };

function Shelves({ basinPath, shelves }: { basinPath: string; shelves: Shelf[] }) {
  const { form, system } = useTakeoffField();
  const shelvesPath = `${basinPath}.shelves`;
  const unit = measurementUnit('in', system);
  return (
    <Stack gap={4}>
      <Text size="sm" fw={500}>
        Plant shelves, from the top down
      </Text>
      {shelves.length === 0 ? (
        <Text size="sm" c="dimmed">
          No shelves: the walls go straight to the floor.
        </Text>
      ) : (
        <Table withRowBorders={false} verticalSpacing={4} highlightOnHover={false}>
          <Table.Thead>
            <Table.Tr>
              <Table.Th w={40}>#</Table.Th>
              <Table.Th>Width ({unit})</Table.Th>
              <Table.Th>Depth below water ({unit})</Table.Th>
              <Table.Th w={40} />
            </Table.Tr>
          </Table.Thead>
          <Table.Tbody>
            {shelves.map((_, k) => (
              <Table.Tr key={k}>
                <Table.Td>
                  <Text size="sm" c="dimmed">
                    {k + 1}
                  </Text>
                </Table.Td>
                <Table.Td>
                  <MeasurementInput
                    size="sm"
                    path={`${shelvesPath}.${k}.widthIn`}
                    kind="in"
                    label={null}
                    aria-label={`Shelf ${k + 1} width (${unit})`}
                  />
                </Table.Td>
                <Table.Td>
                  <MeasurementInput
                    size="sm"
                    path={`${shelvesPath}.${k}.depthIn`}
                    kind="in"
                    label={null}
                    aria-label={`Shelf ${k + 1} depth below water (${unit})`}
                  />
                </Table.Td>
                <Table.Td>
                  <RemoveButton
                    label={`Remove shelf ${k + 1}`}
                    onClick={() => form.removeListItem(shelvesPath, k)}
                  />
                </Table.Td>
              </Table.Tr>
            ))}
          </Table.Tbody>
        </Table>
      )}
      <AddButton
        onClick={() =>
          form.insertListItem(
            shelvesPath,
            NEW_PART.shelf(numberOr(shelves[shelves.length - 1]?.depthIn, 0)),
          )
        }
        disabled={shelves.length >= INPUT_LIMITS.shelves}
      >
        Add shelf
      </AddButton>
    </Stack>
  );
}

function BasinFields({ index, onRemove }: { index: number; onRemove: () => void }) {
  const { form, field } = useTakeoffField();
  const basin = form.getValues().basins[index]!;
  const path = `basins.${index}`;
  const outlinePath = `${path}.outline`;
  return (
    <PartFieldset legend={`Basin ${index + 1}`} onRemove={onRemove}>
      <Stack gap="sm">
        <Input.Wrapper label="Outline" id={inputId(outlinePath)} labelElement="div">
          <SegmentedControl
            fullWidth
            aria-labelledby={`${inputId(outlinePath)}-label`}
            data={SHAPES.map((s) => ({ ...s }))}
            value={basin.outline.shape}
            onChange={(shape) =>
              form.setFieldValue(
                outlinePath,
                changeShape(basin.outline, shape as OutlineInput['shape']),
              )
            }
          />
        </Input.Wrapper>
        {basin.outline.shape === 'freeform' ? (
          <OutlinePoints path={outlinePath} points={basin.outline.pointsFt} />
        ) : (
          <SimpleGrid cols={2} spacing="sm">
            <MeasurementInput path={`${outlinePath}.lengthFt`} kind="ft" />
            <MeasurementInput path={`${outlinePath}.widthFt`} kind="ft" />
          </SimpleGrid>
        )}
        <SimpleGrid cols={{ base: 1, xs: 2 }} spacing="sm">
          <MeasurementInput path={`${path}.maxDepthFt`} kind="ft" />
          <Input.Wrapper
            label="Walls"
            id={inputId(`${path}.wallStyle`)}
            labelElement="div"
            error={field(`${path}.wallStyle`).error}
          >
            <SegmentedControl
              fullWidth
              aria-labelledby={`${inputId(`${path}.wallStyle`)}-label`}
              data={WALL_STYLES}
              {...form.getInputProps(`${path}.wallStyle`)}
            />
          </Input.Wrapper>
        </SimpleGrid>
        <Shelves basinPath={path} shelves={basin.shelves} />
      </Stack>
    </PartFieldset>
  );
}

export function BasinsFields() {
  const { form } = useTakeoffField();
  const basins = form.getValues().basins;
  return (
    <Stack gap="sm">
      {basins.map((_, i) => (
        <BasinFields key={i} index={i} onRemove={() => form.removeListItem('basins', i)} />
      ))}
      {basins.length === 0 && (
        <Text size="sm" c="dimmed">
          No basin: a pond-free waterfall or a stream on its own.
        </Text>
      )}
      <GroupError path="basins" />
      <Group>
        <AddButton
          onClick={() => form.insertListItem('basins', NEW_PART.basin())}
          disabled={basins.length >= INPUT_LIMITS.basins}
        >
          Add basin
        </AddButton>
      </Group>
    </Stack>
  );
}
