import { ActionIcon, Group, Paper, Popover, Text } from '@mantine/core';
import type { Explanation } from '@pondwright/shared/engine';
import { IconHelpCircle } from '@tabler/icons-react';
import type { KeyFigure } from '../utils/key-figures';
import { ExplanationDetails } from './explanation-details';

export function ExplainButton({ label, explanation }: { label: string; explanation: Explanation }) {
  return (
    <Popover width={420} position="bottom-end" shadow="md" withArrow>
      <Popover.Target>
        <ActionIcon
          variant="subtle"
          color="stone"
          size="sm"
          aria-label={`How ${label.toLowerCase()} was computed`}
        >
          <IconHelpCircle size={16} stroke={1.6} />
        </ActionIcon>
      </Popover.Target>
      <Popover.Dropdown>
        <Text fw={600} size="sm" mb="xs">
          {label}
        </Text>
        <ExplanationDetails explanation={explanation} />
      </Popover.Dropdown>
    </Popover>
  );
}

export function FigureCard({ figure }: { figure: KeyFigure }) {
  return (
    <Paper p="sm" aria-label={figure.label} component="article">
      <Group justify="space-between" gap={4} wrap="nowrap" align="flex-start">
        <Text size="xs" c="dimmed" fw={500}>
          {figure.label}
        </Text>
        {figure.explanation && (
          <ExplainButton label={figure.label} explanation={figure.explanation} />
        )}
      </Group>
      <Text fw={600} fz="lg" lh={1.3}>
        {figure.value}
      </Text>
      {figure.detail && (
        <Text size="xs" c="dimmed">
          {figure.detail}
        </Text>
      )}
    </Paper>
  );
}
