import { SimpleGrid, Stack, Text, Title } from '@mantine/core';
import type { Takeoff } from '@pondwright/shared/engine';
import { memo } from 'react';
import { keyFigureGroups } from '../utils/key-figures';
import { CautionsList } from './cautions-list';
import { FigureCard } from './figure-card';
import { HowItWasComputed } from './how-it-was-computed';
import { LaborCard } from './labor-card';
import { PumpChart } from './pump-chart';

type TakeoffResultsProps = {
  takeoff: Takeoff;
  onShowField: (field: string) => void;
};

/** Memoised: the form re-renders on every keystroke, the figures only when a new takeoff arrives. */
export const TakeoffResults = memo(function TakeoffResults({
  takeoff,
  onShowField,
}: TakeoffResultsProps) {
  return (
    <Stack gap="lg">
      {keyFigureGroups(takeoff).map((group) => (
        <section key={group.title} aria-label={group.title}>
          <Title order={3} fz="h5" mb="xs">
            {group.title}
          </Title>
          <SimpleGrid cols={{ base: 1, xs: 2, lg: 3 }} spacing="xs">
            {group.figures.map((figure) => (
              <FigureCard key={figure.key} figure={figure} />
            ))}
          </SimpleGrid>
        </section>
      ))}
      {takeoff.hydraulics && takeoff.hydraulics.candidates.length > 0 && (
        <PumpChart takeoff={takeoff} />
      )}
      <section aria-label="Labor">
        <Title order={3} fz="h5" mb="xs">
          Labor
        </Title>
        <LaborCard takeoff={takeoff} />
      </section>
      {takeoff.cautions.length > 0 && (
        <CautionsList cautions={takeoff.cautions} onShowField={onShowField} />
      )}
      <section aria-labelledby="how-computed-title">
        <Title order={3} fz="h5" id="how-computed-title">
          How it was computed
        </Title>
        <Text size="xs" c="dimmed" mb="xs">
          Each figure&apos;s formula, the numbers put in (in US units), its rounding and sources.
        </Text>
        <HowItWasComputed takeoff={takeoff} />
      </section>
    </Stack>
  );
});
