import { NumberInput, SimpleGrid, Stack, Text } from '@mantine/core';
import { BOULDER_SIZES, defaultEngineParameters } from '@pondwright/shared/engine';
import { formatMeasurement } from '../utils/measurement';
import { GroupError } from './form-parts';
import { MeasurementInput } from './measurement-input';
import { useTakeoffField } from './takeoff-form-context';

const SIZE_IN = defaultEngineParameters.rock.boulderSizeIn;
const SIZE_NAMES = { small: 'Small', medium: 'Medium', large: 'Large' } as const;

export function RockFields() {
  const { form, field, system } = useTakeoffField();
  const mix = form.getValues().rock.boulderMixPct;
  const total = BOULDER_SIZES.reduce((sum, size) => sum + (Number(mix[size]) || 0), 0);
  return (
    <Stack gap="sm">
      <Text size="sm" fw={500}>
        Boulder mix by size{' '}
        <Text span size="sm" c={Math.abs(total - 100) < 0.01 ? 'dimmed' : 'clay.8'}>
          (adds up to {total} %)
        </Text>
      </Text>
      <SimpleGrid cols={3} spacing="sm">
        {BOULDER_SIZES.map((size) => (
          <NumberInput
            key={size}
            hideControls
            {...field(`rock.boulderMixPct.${size}`, {
              label: `${SIZE_NAMES[size]}, ${formatMeasurement(SIZE_IN[size], 'in', system)} (%)`,
            })}
          />
        ))}
      </SimpleGrid>
      <GroupError path="rock.boulderMixPct" />
      <Text size="sm" fw={500}>
        Boulder coverage
      </Text>
      <SimpleGrid cols={3} spacing="sm">
        <NumberInput hideControls {...field('rock.wallCoveragePct')} />
        <NumberInput hideControls {...field('rock.shelfCoveragePct')} />
        <NumberInput hideControls {...field('rock.streamEdgeCoveragePct')} />
      </SimpleGrid>
      <Text size="sm" fw={500}>
        Gravel depth
      </Text>
      <SimpleGrid cols={3} spacing="sm">
        <MeasurementInput path="rock.floorGravelDepthIn" kind="in" />
        <MeasurementInput path="rock.shelfGravelDepthIn" kind="in" />
        <MeasurementInput path="rock.streamGravelDepthIn" kind="in" />
      </SimpleGrid>
    </Stack>
  );
}
