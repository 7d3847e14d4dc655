import { z } from 'zod';

/**
 * A finite number with friendly messages: "Required." when missing, "Must be a number." for NaN,
 * text or infinity, then the range checks. `unit` is shown in the messages.
 */
export function quantity(
  unit: string,
  range: { min?: number; minExclusive?: number; max: number },
) {
  let schema = z.number({
    error: (issue) => (issue.input === undefined ? 'Required.' : 'Must be a finite number.'),
  });
  if (range.minExclusive !== undefined) {
    schema = schema.gt(range.minExclusive, {
      error: `Must be more than ${range.minExclusive} ${unit}.`,
    });
  }
  if (range.min !== undefined) {
    schema = schema.min(range.min, { error: `Must be at least ${range.min} ${unit}.` });
  }
  return schema.max(range.max, {
    error: `Must be at most ${range.max.toLocaleString('en-US')} ${unit}.`,
  });
}

/** A whole count from 0 (or `min`) to `max`. */
export function count(max: number, min = 0) {
  return z
    .number({
      error: (issue) => (issue.input === undefined ? 'Required.' : 'Must be a whole number.'),
    })
    .int({ error: 'Must be a whole number.' })
    .min(min, { error: `Must be at least ${min}.` })
    .max(max, { error: `Must be at most ${max}.` });
}

/** One of a fixed list of choices. */
export function choice<const T extends readonly [string, ...string[]]>(values: T) {
  return z.enum(values, {
    error: (issue) =>
      issue.input === undefined ? 'Required.' : `Choose one of: ${values.join(', ')}.`,
  });
}

/** An object section with a "Required." message when it is missing. */
export function section<T extends z.ZodRawShape>(shape: T) {
  return z.object(shape, {
    error: (issue) => (issue.input === undefined ? 'Required.' : 'Must be an object.'),
  });
}

/** A list with a "Required." message when it is missing and a stated maximum length. */
export function list<T extends z.ZodType>(item: T, max: number, min = 0) {
  return z
    .array(item, {
      error: (issue) => (issue.input === undefined ? 'Required.' : 'Must be a list.'),
    })
    .min(min, { error: min === 1 ? 'Add at least one.' : `Add at least ${min}.` })
    .max(max, { error: `At most ${max} allowed.` });
}
