import { Group, NativeSelect, Paper, SegmentedControl, Stack, TextInput } from '@mantine/core';
import type { CrewLine } from '../utils/crew-budget';
import { MOVEMENT_LABELS, unitLabel, type Movement } from '../utils/labels';
import { countsLoads, type QuantityKind, type QuantityValues } from '../utils/log-values';
import { DeliveryFields } from './delivery-fields';
import type { LogForm } from './log-form-types';
import { RemoveRowButton } from './remove-row-button';

const OTHER = 'other';

const NAMES: Record<QuantityKind, { row: string; choose: string; other: string }> = {
  material: { row: 'Material', choose: 'Choose a material', other: 'Something not on the plan' },
  equipment: { row: 'Equipment', choose: 'Choose equipment', other: 'Other equipment' },
  disposal: { row: 'Disposal', choose: 'Choose what was hauled', other: 'Other disposal' },
};

/** Disposal is counted in truck loads or loose cubic yards; the plan's own unit comes first. */
function disposalUnits(entry: QuantityValues): Array<{ value: string; label: string }> {
  const units = [...new Set([entry.unit, 'load', 'cu yd'].filter(Boolean))];
  return units.map((unit) => ({ value: unit, label: unitLabel(unit) }));
}

type QuantityRowProps = {
  form: LogForm;
  index: number;
  number: number;
  entry: QuantityValues;
  /** The crew budget lines of this row's kind. */
  lines: CrewLine[];
  /** The load size a disposal row switched to loads starts with; '' for none. */
  loadVolume: string;
};

export function QuantityRow({ form, index, number, entry, lines, loadVolume }: QuantityRowProps) {
  const path = `entries.${index}` as const;
  const names = NAMES[entry.kind];

  // A row that comes to count loads starts with the size the crew used last; one it had is kept.
  const withUnit = (unit: string): QuantityValues => {
    const size = entry.loadVolumeLooseCubicYards ?? '';
    const sized = countsLoads({ kind: entry.kind, unit }) && size === '' ? loadVolume : size;
    return { ...entry, unit, loadVolumeLooseCubicYards: sized };
  };
  const pick = (value: string) => {
    const line = lines.find((candidate) => candidate.id === value);
    form.replaceListItem('entries', index, {
      ...withUnit(line?.unit ?? entry.unit),
      lineId: line?.id ?? (value === OTHER ? null : ''),
      code: line?.code ?? null,
      description: line?.description ?? '',
    });
  };
  const description = form.getInputProps(`${path}.description`);
  const unit = form.getInputProps(`${path}.unit`);

  return (
    <Paper withBorder p="sm" role="group" aria-label={`${names.row} ${number}`}>
      <Stack gap="xs">
        {entry.kind === 'material' && (
          <SegmentedControl
            fullWidth
            size="md"
            aria-label="Delivered, used or returned"
            data={Object.entries(MOVEMENT_LABELS).map(([value, label]) => ({ value, label }))}
            value={entry.movement ?? 'used'}
            onChange={(value) => form.setFieldValue(`${path}.movement`, value as Movement)}
          />
        )}
        {lines.length > 0 && (
          <NativeSelect
            label={names.row}
            size="md"
            data={[
              ...(entry.lineId === '' ? [{ value: '', label: names.choose }] : []),
              ...lines.map((line) => ({
                value: line.id,
                label: `${line.description} (${unitLabel(line.unit)})`,
              })),
              { value: OTHER, label: names.other },
            ]}
            value={entry.lineId ?? OTHER}
            onChange={(event) => pick(event.currentTarget.value)}
            // Until a line is picked, "Describe it" belongs here: there is no text field to show it on.
            error={entry.lineId !== null ? description.error : undefined}
          />
        )}
        {(entry.lineId === null || lines.length === 0) && (
          <TextInput label="What was it?" size="md" {...description} />
        )}
        <Group gap="xs" align="flex-start" wrap="nowrap">
          <TextInput
            label={
              entry.kind === 'equipment' && entry.unit === 'day'
                ? 'Days'
                : countsLoads(entry)
                  ? 'Loads'
                  : 'Quantity'
            }
            size="md"
            inputMode="decimal"
            style={{ flex: 1 }}
            {...form.getInputProps(`${path}.quantity`)}
          />
          {entry.kind === 'disposal' ? (
            <NativeSelect
              label="Unit"
              size="md"
              w={110}
              data={disposalUnits(entry)}
              {...unit}
              onChange={(event) =>
                form.replaceListItem('entries', index, withUnit(event.currentTarget.value))
              }
            />
          ) : (
            <TextInput
              label="Unit"
              size="md"
              w={110}
              autoCapitalize="none"
              {...form.getInputProps(`${path}.unit`)}
            />
          )}
          <RemoveRowButton
            label={`${names.row.toLowerCase()} row ${number}`}
            onClick={() => form.removeListItem('entries', index)}
          />
        </Group>
        {countsLoads(entry) && (
          <TextInput
            label="Load size (loose yd³)"
            description="The truck’s or container’s capacity, such as 10 for a tandem dump truck or 6 for a skid-steer trailer. Each load counts as full, even when it was not."
            placeholder="10"
            size="md"
            inputMode="decimal"
            {...form.getInputProps(`${path}.loadVolumeLooseCubicYards`)}
            value={entry.loadVolumeLooseCubicYards ?? ''}
          />
        )}
        {entry.kind === 'material' && entry.movement === 'delivered' && (
          <DeliveryFields form={form} path={path} ticketNumber={entry.ticketNumber} />
        )}
      </Stack>
    </Paper>
  );
}
