import { createFormContext } from '@mantine/form';
import type { TakeoffInput } from '@pondwright/shared/engine';
import { createContext, useContext } from 'react';
import type { FieldErrorMap } from '../utils/field-errors';
import { FIELD_LABELS } from '../utils/field-labels';

export const [TakeoffFormProvider, useTakeoffFormContext, useTakeoffForm] =
  createFormContext<TakeoffInput>();

/** The engine's messages for the values last computed, by form path. */
export const FieldErrorsContext = createContext<FieldErrorMap>({});

/** A DOM id for the input at a form path, so the error summary can take the user to it. */
export function inputId(path: string): string {
  return `takeoff-${path.replace(/\./g, '-')}`;
}

const lastSegment = (path: string) => path.slice(path.lastIndexOf('.') + 1);

/**
 * The form, the unit system its measurements are shown in, and a `field(path)` helper giving an
 * input its value, change handler, label (with the US unit) and the engine's message for that path.
 */
export function useTakeoffField() {
  const form = useTakeoffFormContext();
  const errors = useContext(FieldErrorsContext);
  const field = (path: string, options: { label?: string | null } = {}) => ({
    ...form.getInputProps(path),
    id: inputId(path),
    error: errors[path],
    label: options.label === null ? undefined : (options.label ?? FIELD_LABELS[lastSegment(path)]),
  });
  return { form, errors, field, system: form.getValues().unitSystem };
}
