import { Group, NativeSelect, Paper, Stack, TextInput } from '@mantine/core';
import { TASK_OPTIONS } from '../utils/labels';
import type { LogForm } from './log-form-types';
import { RemoveRowButton } from './remove-row-button';

type HoursRowProps = {
  form: LogForm;
  index: number;
  number: number;
  /** A datalist of the names already on this job, so a name is tapped rather than typed. */
  peopleListId: string;
};

export function HoursRow({ form, index, number, peopleListId }: HoursRowProps) {
  const path = `entries.${index}` as const;
  const label = `hours row ${number}`;
  return (
    <Paper withBorder p="sm" role="group" aria-label={`Hours ${number}`}>
      <Stack gap="xs">
        <TextInput
          label="Person"
          size="md"
          list={peopleListId}
          autoCapitalize="words"
          autoComplete="off"
          {...form.getInputProps(`${path}.person`)}
        />
        <NativeSelect
          label="Task"
          size="md"
          data={[{ value: '', label: 'Choose a task' }, ...TASK_OPTIONS]}
          {...form.getInputProps(`${path}.task`)}
        />
        <Group gap="xs" align="flex-start" wrap="nowrap">
          <TextInput
            label="Hours"
            size="md"
            inputMode="decimal"
            placeholder="7.5"
            style={{ flex: 1 }}
            {...form.getInputProps(`${path}.hours`)}
          />
          <RemoveRowButton label={label} onClick={() => form.removeListItem('entries', index)} />
        </Group>
      </Stack>
    </Paper>
  );
}
