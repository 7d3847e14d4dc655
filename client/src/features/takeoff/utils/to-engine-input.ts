/**
 * The form's values as the engine should hear them. A cleared number field holds '' in a Mantine
 * form; it becomes `undefined`, so the engine answers "Required." rather than "Must be a number."
 */
export function toEngineInput(value: unknown): unknown {
  if (value === '') return undefined;
  if (Array.isArray(value)) return value.map(toEngineInput);
  if (value !== null && typeof value === 'object') {
    return Object.fromEntries(
      Object.entries(value).map(([key, entry]) => [key, toEngineInput(entry)]),
    );
  }
  return value;
}
