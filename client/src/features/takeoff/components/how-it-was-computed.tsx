import { Accordion, Group, Text } from '@mantine/core';
import type { Takeoff } from '@pondwright/shared/engine';
import { formatQuantity } from '../utils/format-quantity';
import { explanationLabel } from '../utils/key-figures';
import { ExplanationDetails } from './explanation-details';

/** Every figure the engine explains, in the order it computed them. */
export function HowItWasComputed({ takeoff }: { takeoff: Takeoff }) {
  return (
    <Accordion multiple variant="contained" chevronPosition="left">
      {takeoff.explanations.map((explanation) => (
        <Accordion.Item key={explanation.figure} value={explanation.figure}>
          <Accordion.Control>
            <Group justify="space-between" wrap="nowrap" gap="sm">
              <Text size="sm">{explanationLabel(explanation, takeoff)}</Text>
              <Text size="sm" fw={600} style={{ whiteSpace: 'nowrap' }}>
                {formatQuantity(explanation.display)}
              </Text>
            </Group>
          </Accordion.Control>
          <Accordion.Panel>
            <ExplanationDetails explanation={explanation} />
          </Accordion.Panel>
        </Accordion.Item>
      ))}
    </Accordion>
  );
}
