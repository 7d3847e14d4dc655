import { Paper, SimpleGrid, Title } from '@mantine/core';
import { takeoffInputSchema, type Takeoff, type TakeoffInput } from '@pondwright/shared/engine';
import { useMemo, useState } from 'react';
import { CrossSection } from './cross-section';
import { PlanView } from './plan-view';

type TakeoffDrawingsProps = {
  /** The measurements as they stand; while they do not validate, the last valid ones are drawn. */
  input: unknown;
  takeoff: Takeoff;
};

/** The plan and the first basin's cross-section, side by side where there is room. */
export function TakeoffDrawings({ input, takeoff }: TakeoffDrawingsProps) {
  const parsed = useMemo(() => takeoffInputSchema.safeParse(input), [input]);
  const [lastValid, setLastValid] = useState<TakeoffInput | null>(
    parsed.success ? parsed.data : null,
  );
  if (parsed.success && JSON.stringify(parsed.data) !== JSON.stringify(lastValid)) {
    setLastValid(parsed.data);
  }
  const drawn = parsed.success ? parsed.data : lastValid;
  if (!drawn || (drawn.basins.length === 0 && drawn.streams.length === 0)) return null;

  return (
    <SimpleGrid cols={{ base: 1, sm: 2 }} spacing="xs">
      <Paper p="sm" component="figure" m={0}>
        <Title order={3} fz="h5" mb={4} component="figcaption">
          Plan
        </Title>
        <PlanView input={drawn} />
      </Paper>
      {drawn.basins.length > 0 && (
        <Paper p="sm" component="figure" m={0}>
          <Title order={3} fz="h5" mb={4} component="figcaption">
            Cross-section
          </Title>
          <CrossSection input={drawn} takeoff={takeoff} />
        </Paper>
      )}
    </SimpleGrid>
  );
}
