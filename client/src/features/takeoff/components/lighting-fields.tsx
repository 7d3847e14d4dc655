import { Group, NumberInput, Select, SimpleGrid, Stack, Text } from '@mantine/core';
import { CABLE_GAUGES_AWG } from '@pondwright/shared/engine';
import { NEW_PART } from '../utils/default-input';
import { AddButton, GroupError, PartFieldset, RemoveButton } from './form-parts';
import { MeasurementInput } from './measurement-input';
import { useTakeoffField } from './takeoff-form-context';

const GAUGES = CABLE_GAUGES_AWG.map((gauge) => ({ value: gauge, label: `${gauge} AWG` }));

function Fixtures({ runIndex, watts }: { runIndex: number; watts: number[] }) {
  const { form, field } = useTakeoffField();
  const path = `lighting.${runIndex}.fixtureWatts`;
  return (
    <Stack gap={4}>
      <Text size="sm" fw={500}>
        Fixtures along the run, watts each (W)
      </Text>
      <Group gap="xs" align="flex-start">
        {watts.map((_, k) => (
          <Group key={k} gap={2} wrap="nowrap" align="flex-start">
            <NumberInput
              w={80}
              size="sm"
              hideControls
              aria-label={`Run ${runIndex + 1}, fixture ${k + 1} (W)`}
              {...field(`${path}.${k}`, { label: null })}
            />
            {watts.length > 1 && (
              <RemoveButton
                label={`Remove fixture ${k + 1} of run ${runIndex + 1}`}
                onClick={() => form.removeListItem(path, k)}
              />
            )}
          </Group>
        ))}
      </Group>
      <GroupError path={path} />
      <AddButton onClick={() => form.insertListItem(path, watts[watts.length - 1] ?? 20)}>
        Add fixture
      </AddButton>
    </Stack>
  );
}

export function LightingFields() {
  const { form, field } = useTakeoffField();
  const runs = form.getValues().lighting;
  return (
    <Stack gap="sm">
      {runs.length === 0 && (
        <Text size="sm" c="dimmed">
          No lighting.
        </Text>
      )}
      {runs.map((run, i) => (
        <PartFieldset
          key={i}
          legend={`Lighting run ${i + 1}`}
          onRemove={() => form.removeListItem('lighting', i)}
        >
          <Stack gap="sm">
            <SimpleGrid cols={2} spacing="sm">
              <MeasurementInput path={`lighting.${i}.cableLengthFt`} kind="ft" />
              <Select data={GAUGES} allowDeselect={false} {...field(`lighting.${i}.gaugeAwg`)} />
            </SimpleGrid>
            <Fixtures runIndex={i} watts={run.fixtureWatts} />
          </Stack>
        </PartFieldset>
      ))}
      <AddButton onClick={() => form.insertListItem('lighting', NEW_PART.lightingRun())}>
        Add lighting run
      </AddButton>
    </Stack>
  );
}
