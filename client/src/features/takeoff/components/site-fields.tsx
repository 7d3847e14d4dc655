import {
  Input,
  NumberInput,
  SegmentedControl,
  Select,
  SimpleGrid,
  Stack,
  Switch,
  Text,
} from '@mantine/core';
import { defaultEngineParameters, SOIL_TYPES } from '@pondwright/shared/engine';
import { NEW_PART } from '../utils/default-input';
import { formatMeasurement } from '../utils/measurement';
import { PartFieldset } from './form-parts';
import { MeasurementInput } from './measurement-input';
import { inputId, useTakeoffField } from './takeoff-form-context';

const SOILS = SOIL_TYPES.map((soil) => ({
  value: soil,
  label: defaultEngineParameters.soils[soil].label,
}));

const VEHICLES = defaultEngineParameters.excavation.haulVehicles.map((vehicle) => ({
  value: vehicle.id,
  label: vehicle.label,
}));

const METHODS = [
  { value: 'auto', label: 'By access' },
  { value: 'hand', label: 'By hand' },
  { value: 'machine', label: 'Machine' },
];

const MACHINE_MIN_ACCESS_IN = defaultEngineParameters.excavation.machineMinAccessWidthIn;

export function SiteFields() {
  const { form, field, system } = useTakeoffField();
  const methodPath = 'site.excavationMethod';
  return (
    <Stack gap="sm">
      <SimpleGrid cols={2} spacing="sm">
        <Select data={SOILS} allowDeselect={false} {...field('site.soil')} />
        <NumberInput hideControls {...field('site.slopePct')} />
        <MeasurementInput
          path="site.accessWidthIn"
          kind="in"
          description="Gate or gap the crew and machine pass"
        />
        <MeasurementInput
          path="site.carryDistanceFt"
          kind="ft"
          description="From where trucks can dump"
        />
      </SimpleGrid>
      <Input.Wrapper
        label="Digging"
        id={inputId(methodPath)}
        labelElement="div"
        description={`"By access" digs by machine when the access is at least ${formatMeasurement(MACHINE_MIN_ACCESS_IN, 'in', system)} wide.`}
        error={field(methodPath).error}
      >
        <SegmentedControl
          fullWidth
          aria-labelledby={`${inputId(methodPath)}-label`}
          data={METHODS}
          {...form.getInputProps(methodPath)}
        />
      </Input.Wrapper>
      <SimpleGrid cols={2} spacing="sm">
        <Select data={VEHICLES} allowDeselect={false} {...field('site.haulVehicleId')} />
        <NumberInput hideControls {...field('site.spoilHauledPct')} />
      </SimpleGrid>
    </Stack>
  );
}

const ALREADY_DUG = 'renovation.basinsAlreadyExcavated';

export function RenovationFields() {
  const { form, field } = useTakeoffField();
  const renovation = form.getValues().renovation;
  const alreadyDug = field(ALREADY_DUG);
  return (
    <Stack gap="sm">
      <Switch
        label="Renovation"
        description="Rebuilding an existing pond: old liner out, old rock reused."
        checked={renovation !== null}
        onChange={(event) =>
          form.setFieldValue(
            'renovation',
            event.currentTarget.checked ? NEW_PART.renovation() : null,
          )
        }
      />
      {renovation && (
        <PartFieldset legend="Renovation">
          <Stack gap="sm">
            <Switch
              {...form.getInputProps(ALREADY_DUG, { type: 'checkbox' })}
              id={alreadyDug.id}
              label={alreadyDug.label}
              error={alreadyDug.error}
              description="The basins are reused as they are and not dug again."
            />
            <SimpleGrid cols={2} spacing="sm">
              <MeasurementInput path="renovation.oldLinerAreaSqFt" kind="sqFt" />
              <MeasurementInput path="renovation.oldRockShortTons" kind="shortTon" />
              <NumberInput hideControls {...field('renovation.rockReusedPct')} />
            </SimpleGrid>
          </Stack>
        </PartFieldset>
      )}
    </Stack>
  );
}

export function CrewFields() {
  const { field } = useTakeoffField();
  return (
    <Stack gap="sm">
      <SimpleGrid cols={2} spacing="sm">
        <NumberInput min={1} allowDecimal={false} {...field('crew.size')} />
        <NumberInput hideControls {...field('crew.hoursPerDay')} />
      </SimpleGrid>
      <Text size="xs" c="dimmed">
        Crew-days are the labor-hours shared out over the crew and the working day.
      </Text>
    </Stack>
  );
}
