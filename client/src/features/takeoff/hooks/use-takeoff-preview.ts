import { useDebouncedValue } from '@mantine/hooks';
import {
  computeTakeoff,
  defaultEngineParameters,
  type EngineGeometry,
  type FieldError,
  type Takeoff,
  type TakeoffInput,
} from '@pondwright/shared/engine';
import { useDeferredValue, useMemo, useState } from 'react';
import { toFieldErrorMap } from '../utils/field-errors';
import { toEngineInput } from '../utils/to-engine-input';

/** Long enough to skip the keystrokes of one number, short enough to feel instant. */
export const PREVIEW_DELAY_MS = 150;

const NO_ERRORS: FieldError[] = [];

/**
 * Runs the takeoff engine in the browser on the form's values as the user types. While the values do
 * not compute, the last good takeoff stays on screen beside the field messages. `waitForGeometry`
 * holds the preview while the polygon-offset module loads, instead of flashing its "not loaded" message.
 */
export function useTakeoffPreview(
  values: TakeoffInput,
  geometry: EngineGeometry,
  waitForGeometry: boolean,
) {
  const [debounced] = useDebouncedValue(values, PREVIEW_DELAY_MS);
  const computed = useDeferredValue(debounced);
  const result = useMemo(
    () =>
      waitForGeometry
        ? null
        : computeTakeoff(toEngineInput(computed), defaultEngineParameters, geometry),
    [computed, geometry, waitForGeometry],
  );
  const [lastTakeoff, setLastTakeoff] = useState<Takeoff | null>(
    result?.ok ? result.takeoff : null,
  );
  if (result?.ok && result.takeoff !== lastTakeoff) setLastTakeoff(result.takeoff);

  const errors = result && !result.ok ? result.errors : NO_ERRORS;
  const errorMap = useMemo(() => toFieldErrorMap(errors), [errors]);
  return {
    takeoff: lastTakeoff,
    /** The takeoff on screen is from earlier values, which did compute. */
    stale: result !== null && !result.ok && lastTakeoff !== null,
    errors,
    errorMap,
    updating: computed !== values || waitForGeometry,
  };
}
