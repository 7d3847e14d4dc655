import { ActionIcon, Button, Fieldset, Group, Text, type FieldsetProps } from '@mantine/core';
import { IconPlus, IconTrash } from '@tabler/icons-react';
import type { ReactNode } from 'react';
import { inputId, useTakeoffField } from './takeoff-form-context';

export function AddButton({
  children,
  onClick,
  disabled,
}: {
  children: ReactNode;
  onClick: () => void;
  disabled?: boolean;
}) {
  return (
    <Button
      variant="subtle"
      size="compact-sm"
      leftSection={<IconPlus size={14} />}
      onClick={onClick}
      disabled={disabled}
      style={{ alignSelf: 'flex-start' }}
    >
      {children}
    </Button>
  );
}

export function RemoveButton({ label, onClick }: { label: string; onClick: () => void }) {
  return (
    <ActionIcon variant="subtle" color="stone" aria-label={label} title={label} onClick={onClick}>
      <IconTrash size={16} />
    </ActionIcon>
  );
}

/** A message the engine gives for a whole group (an outline that crosses itself, a boulder mix). */
export function GroupError({ path }: { path: string }) {
  const { errors } = useTakeoffField();
  const message = errors[path];
  if (!message) return null;
  return (
    <Text id={inputId(path)} size="sm" c="red.8" role="alert" tabIndex={-1}>
      {message}
    </Text>
  );
}

/** One part of the feature (a basin, a stream) with its remove button beside the legend. */
export function PartFieldset({
  legend,
  onRemove,
  removeLabel,
  children,
  ...props
}: {
  legend: string;
  onRemove?: () => void;
  removeLabel?: string;
  children: ReactNode;
} & Omit<FieldsetProps, 'legend'>) {
  return (
    <Fieldset
      variant="filled"
      p="sm"
      legend={
        <Group gap={4} wrap="nowrap">
          <Text fw={600} size="sm">
            {legend}
          </Text>
          {onRemove && (
            <RemoveButton label={removeLabel ?? `Remove ${legend}`} onClick={onRemove} />
          )}
        </Group>
      }
      {...props}
    >
      {children}
    </Fieldset>
  );
}
