import { NumberInput, type NumberInputProps } from '@mantine/core';
import { useState } from 'react';
import { toShownValue, toUsValue, withUnit, type MeasurementKind } from '../utils/measurement';
import { useTakeoffField } from './takeoff-form-context';

type MeasurementInputProps = Omit<NumberInputProps, 'value' | 'onChange' | 'label'> & {
  /** The form path of a US field, e.g. `basins.0.maxDepthFt`. */
  path: string;
  kind: MeasurementKind;
  /** null when a table header labels the input (pass an `aria-label` with the unit instead). */
  label?: string | null;
};

type Entry = { usValue: unknown; system: string; shown: number | string };

/**
 * A number input for a measurement the form stores in the engine's US unit. In metric it shows and
 * takes metres, centimetres, square metres or tonnes, and converts what is typed with the exact
 * factors. The stored value changes only when the user types, so switching systems back and forth
 * never drifts it; only what is shown is rounded.
 */
export function MeasurementInput({ path, kind, label, ...props }: MeasurementInputProps) {
  const { field, system } = useTakeoffField();
  const { value, onChange, label: usLabel, ...input } = field(path, { label });
  // What the user typed stays on screen as typed ("4.572", "4."), as long as it is still the value
  // stored and the system has not changed; anything else is shown from the stored value.
  const [entry, setEntry] = useState<Entry | null>(null);
  const shown =
    entry && Object.is(entry.usValue, value) && entry.system === system
      ? entry.shown
      : toShownValue(value, kind, system);

  return (
    <NumberInput
      hideControls
      {...input}
      {...props}
      label={usLabel === undefined ? undefined : withUnit(usLabel, kind, system)}
      value={shown}
      onChange={(next) => {
        const usValue = toUsValue(next, kind, system);
        setEntry({ usValue, system, shown: next });
        onChange(usValue);
      }}
    />
  );
}
