import { NumberInput, Select, SimpleGrid, Stack, Switch, Text } from '@mantine/core';
import { defaultEngineParameters } from '@pondwright/shared/engine';
import { NEW_PART } from '../utils/default-input';
import { MeasurementInput } from './measurement-input';
import { useTakeoffField } from './takeoff-form-context';

const PIPES = defaultEngineParameters.hydraulics.pipes;

const MATERIALS = [...new Map(PIPES.map((p) => [p.material, p.label])).entries()].map(
  ([value, label]) => ({ value, label }),
);

function sizeOptions(material: string) {
  return [
    { value: 'auto', label: 'Auto' },
    ...PIPES.filter((p) => p.material === material).map((p) => ({
      value: String(p.nominalSizeIn),
      label: `${p.nominalSizeIn} in`,
    })),
  ];
}

const FITTINGS = ['elbow90', 'elbow45', 'tee', 'checkValve', 'valve'] as const;

function PipeSizeSelect({ path, material }: { path: string; material: string }) {
  const { form, field } = useTakeoffField();
  const { value, onChange: _onChange, ...props } = field(path);
  return (
    <Select
      {...props}
      data={sizeOptions(material)}
      allowDeselect={false}
      value={value === 'auto' ? 'auto' : String(value)}
      onChange={(next) => form.setFieldValue(path, next === 'auto' ? 'auto' : Number(next))}
    />
  );
}

export function PumpRunFields() {
  const { form, field } = useTakeoffField();
  const run = form.getValues().pumpRun;
  return (
    <Stack gap="sm">
      <Switch
        label="Pump run"
        description="From the skimmer or pump vault to the waterfall filter box or the highest weir."
        checked={run !== null}
        onChange={(event) =>
          form.setFieldValue('pumpRun', event.currentTarget.checked ? NEW_PART.pumpRun() : null)
        }
      />
      {run && (
        <>
          <Select data={MATERIALS} allowDeselect={false} {...field('pumpRun.pipeMaterial')} />
          <SimpleGrid cols={2} spacing="sm">
            <MeasurementInput path="pumpRun.pressurePipeLengthFt" kind="ft" />
            <PipeSizeSelect path="pumpRun.pressurePipeSizeIn" material={run.pipeMaterial} />
            <MeasurementInput path="pumpRun.suctionPipeLengthFt" kind="ft" />
            <PipeSizeSelect path="pumpRun.suctionPipeSizeIn" material={run.pipeMaterial} />
          </SimpleGrid>
          <Text size="xs" c="dimmed">
            Auto picks the smallest size that keeps the water within the velocity limits.
          </Text>
          <MeasurementInput path="pumpRun.elevationFt" kind="ft" />
          <Text size="sm" fw={500}>
            Fittings on the run
          </Text>
          <SimpleGrid cols={{ base: 2, sm: 3 }} spacing="sm">
            {FITTINGS.map((kind) => (
              <NumberInput
                key={kind}
                min={0}
                allowDecimal={false}
                {...field(`pumpRun.fittings.${kind}`)}
              />
            ))}
          </SimpleGrid>
        </>
      )}
    </Stack>
  );
}
