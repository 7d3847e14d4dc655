import { Button, SimpleGrid, Stack, Text } from '@mantine/core';
import { IconPlus } from '@tabler/icons-react';
import { useId } from 'react';
import { linesFor, type CrewLine } from '../utils/crew-budget';
import type { Movement } from '../utils/labels';
import {
  lastLoadVolume,
  newHoursRow,
  newQuantityRow,
  type QuantityKind,
} from '../utils/log-values';
import { HoursRow } from './hours-row';
import type { LogForm } from './log-form-types';
import { LogSection } from './log-section';
import { QuantityRow } from './quantity-row';

const DEFAULT_UNIT: Record<QuantityKind, string> = {
  material: '',
  equipment: 'day',
  disposal: 'load',
};

type AddButtonProps = { label: string; onClick: () => void; name?: string; compact?: boolean };

/** Three compact ones share a 360 px row, so they give up the icon and most of the padding. */
const AddButton = ({ label, onClick, name, compact = false }: AddButtonProps) => (
  <Button
    variant="light"
    size="md"
    fullWidth
    px={compact ? 4 : undefined}
    fz={compact ? 'sm' : undefined}
    leftSection={compact ? undefined : <IconPlus size={18} />}
    onClick={onClick}
    aria-label={name}
  >
    {label}
  </Button>
);

/**
 * The day's rows by kind. The form keeps them in one list in the order they were added, which is the
 * order they are sent, so the server's `entries.3.hours` names the same row as the form's.
 */
export function LogEntries({
  form,
  lines,
  people,
  defaultLoadVolume,
}: {
  form: LogForm;
  lines: CrewLine[];
  people: string[];
  /** The load size disposal in loads starts with, before the day has one of its own; '' for none. */
  defaultLoadVolume: string;
}) {
  const peopleListId = useId();
  const { entries } = form.getValues();
  const loadVolume = lastLoadVolume(entries) ?? defaultLoadVolume;
  const add = (kind: QuantityKind, movement: Movement | null = null) =>
    form.insertListItem(
      'entries',
      newQuantityRow(kind, movement, {
        fromPlan: linesFor(lines, kind).length > 0,
        unit: DEFAULT_UNIT[kind],
        loadVolume,
      }),
    );

  const rowsOf = (kind: QuantityKind) => {
    let number = 0;
    return entries.map((entry, index) => {
      if (entry.kind !== kind) return null;
      number += 1;
      return (
        <QuantityRow
          key={entry.id}
          form={form}
          index={index}
          number={number}
          entry={entry}
          lines={linesFor(lines, kind)}
          loadVolume={loadVolume}
        />
      );
    });
  };

  let hoursNumber = 0;
  return (
    <>
      <LogSection
        title="Hours"
        actions={
          <AddButton
            label="Add hours"
            onClick={() => form.insertListItem('entries', newHoursRow())}
          />
        }
      >
        {entries.map((entry, index) => {
          if (entry.kind !== 'hours') return null;
          hoursNumber += 1;
          return (
            <HoursRow
              key={entry.id}
              form={form}
              index={index}
              number={hoursNumber}
              peopleListId={peopleListId}
            />
          );
        })}
        <datalist id={peopleListId}>
          {people.map((person) => (
            <option key={person} value={person} />
          ))}
        </datalist>
      </LogSection>

      <LogSection
        title="Materials"
        actions={
          <Stack gap={4}>
            <Text size="sm" c="dimmed">
              Add material that was:
            </Text>
            <SimpleGrid cols={3} spacing="xs">
              <AddButton
                compact
                label="Delivered"
                name="Add delivered material"
                onClick={() => add('material', 'delivered')}
              />
              <AddButton
                compact
                label="Used"
                name="Add used material"
                onClick={() => add('material', 'used')}
              />
              <AddButton
                compact
                label="Returned"
                name="Add returned material"
                onClick={() => add('material', 'returned')}
              />
            </SimpleGrid>
          </Stack>
        }
      >
        {rowsOf('material')}
      </LogSection>

      <LogSection
        title="Equipment"
        actions={<AddButton label="Add equipment" onClick={() => add('equipment')} />}
      >
        {rowsOf('equipment')}
      </LogSection>

      <LogSection
        title="Disposal"
        actions={<AddButton label="Add disposal" onClick={() => add('disposal')} />}
      >
        {rowsOf('disposal')}
      </LogSection>
    </>
  );
}
