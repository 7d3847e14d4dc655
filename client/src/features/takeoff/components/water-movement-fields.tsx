import { Input, Select, SegmentedControl, SimpleGrid, Stack, Switch, Text } from '@mantine/core';
import { NEW_PART } from '../utils/default-input';
import { AddButton, GroupError, PartFieldset } from './form-parts';
import { MeasurementInput } from './measurement-input';
import { inputId, useTakeoffField } from './takeoff-form-context';

const SHEETS = [
  { value: 'light', label: 'Light' },
  { value: 'medium', label: 'Medium' },
  { value: 'heavy', label: 'Heavy' },
];

const FILLS = [
  { value: 'rock-gravel', label: 'Rock and gravel' },
  { value: 'storage-blocks', label: 'Water storage blocks' },
];

function Streams() {
  const { form } = useTakeoffField();
  const streams = form.getValues().streams;
  return (
    <Stack gap="sm">
      {streams.map((_, i) => (
        <PartFieldset
          key={i}
          legend={`Stream ${i + 1}`}
          onRemove={() => form.removeListItem('streams', i)}
        >
          <SimpleGrid cols={3} spacing="sm">
            <MeasurementInput path={`streams.${i}.lengthFt`} kind="ft" />
            <MeasurementInput path={`streams.${i}.widthFt`} kind="ft" />
            <MeasurementInput path={`streams.${i}.dropFt`} kind="ft" />
          </SimpleGrid>
        </PartFieldset>
      ))}
      <AddButton onClick={() => form.insertListItem('streams', NEW_PART.stream())}>
        Add stream
      </AddButton>
    </Stack>
  );
}

function Waterfalls() {
  const { form, field } = useTakeoffField();
  const waterfalls = form.getValues().waterfalls;
  return (
    <Stack gap="sm">
      {waterfalls.map((_, i) => {
        const sheetPath = `waterfalls.${i}.sheet`;
        return (
          <PartFieldset
            key={i}
            legend={`Waterfall ${i + 1}`}
            onRemove={() => form.removeListItem('waterfalls', i)}
          >
            <SimpleGrid cols={2} spacing="sm">
              <MeasurementInput path={`waterfalls.${i}.weirWidthIn`} kind="in" />
              <Input.Wrapper
                label="Sheet of water"
                id={inputId(sheetPath)}
                labelElement="div"
                error={field(sheetPath).error}
              >
                <SegmentedControl
                  fullWidth
                  aria-labelledby={`${inputId(sheetPath)}-label`}
                  data={SHEETS}
                  {...form.getInputProps(sheetPath)}
                />
              </Input.Wrapper>
            </SimpleGrid>
          </PartFieldset>
        );
      })}
      <AddButton onClick={() => form.insertListItem('waterfalls', NEW_PART.waterfall())}>
        Add waterfall
      </AddButton>
    </Stack>
  );
}

function PondFreeBasin() {
  const { form, field } = useTakeoffField();
  const box = form.getValues().pondFreeBasin;
  return (
    <Stack gap="sm">
      <Switch
        label="Pond-free waterfall basin"
        description="A buried reservoir under rock or water storage blocks, with no open water."
        checked={box !== null}
        onChange={(event) =>
          form.setFieldValue(
            'pondFreeBasin',
            event.currentTarget.checked ? NEW_PART.pondFreeBasin() : null,
          )
        }
      />
      {box && (
        <PartFieldset legend="Pond-free basin">
          <SimpleGrid cols={2} spacing="sm">
            <MeasurementInput path="pondFreeBasin.lengthFt" kind="ft" />
            <MeasurementInput path="pondFreeBasin.widthFt" kind="ft" />
            <MeasurementInput path="pondFreeBasin.depthFt" kind="ft" />
            <Select data={FILLS} allowDeselect={false} {...field('pondFreeBasin.fill')} />
          </SimpleGrid>
        </PartFieldset>
      )}
    </Stack>
  );
}

export function WaterMovementFields() {
  return (
    <Stack gap="md">
      <Text size="sm" fw={600}>
        Streams
      </Text>
      <Streams />
      <Text size="sm" fw={600}>
        Waterfalls
      </Text>
      <Waterfalls />
      <PondFreeBasin />
      <GroupError path="pondFreeBasin" />
    </Stack>
  );
}
