import { Badge, Button, Group, Paper, Text, TextInput } from '@mantine/core';
import { IconDeviceFloppy } from '@tabler/icons-react';
import { useState } from 'react';
import { todayIsoDate } from '@/lib/format';

type SaveVersionBarProps = {
  changeCount: number;
  problemCount: number;
  saving: boolean;
  onSave: (details: { effectiveDate: string; note: string }) => void;
  onDiscard: () => void;
};

/** Stays at the foot of the screen while the draft has changes: how many, and when they apply. */
export function SaveVersionBar({
  changeCount,
  problemCount,
  saving,
  onSave,
  onDiscard,
}: SaveVersionBarProps) {
  const [effectiveDate, setEffectiveDate] = useState(todayIsoDate);
  const [note, setNote] = useState('');
  const dateMissing = effectiveDate === '';

  return (
    <Paper
      component="section"
      aria-label="Unsaved changes"
      shadow="md"
      p="sm"
      mt="lg"
      pos="sticky"
      bottom="var(--mantine-spacing-md)"
      style={{ zIndex: 5 }}
      bg="reed.0"
    >
      <Group justify="space-between" align="flex-end" gap="sm">
        <Group gap="sm" align="flex-end">
          <div>
            <Text fw={600} size="sm" role="status">
              {changeCount === 1 ? '1 unsaved change' : `${changeCount} unsaved changes`}
            </Text>
            {problemCount > 0 && (
              <Badge color="red" variant="light" mt={4}>
                {problemCount === 1 ? '1 field to fix' : `${problemCount} fields to fix`}
              </Badge>
            )}
          </div>
          <TextInput
            size="xs"
            type="date"
            label="Effective from"
            value={effectiveDate}
            error={dateMissing ? 'Choose a date' : undefined}
            onChange={(event) => setEffectiveDate(event.currentTarget.value)}
          />
          <TextInput
            size="xs"
            w={280}
            label="Note"
            placeholder="What changed and why"
            maxLength={500}
            value={note}
            onChange={(event) => setNote(event.currentTarget.value)}
          />
        </Group>
        <Group gap="xs">
          <Button variant="default" size="sm" onClick={onDiscard} disabled={saving}>
            Discard changes
          </Button>
          <Button
            size="sm"
            leftSection={<IconDeviceFloppy size={16} />}
            loading={saving}
            disabled={problemCount > 0 || dateMissing}
            onClick={() => onSave({ effectiveDate, note: note.trim() })}
          >
            Save as new version
          </Button>
        </Group>
      </Group>
    </Paper>
  );
}
