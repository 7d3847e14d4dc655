import { toFieldErrors } from '@pondwright/shared/engine';
import type { z } from 'zod';
import { fieldErrors } from '../../estimates/field-errors';

/** Parses a request body with a shared zod schema; a 400 naming each field when it does not fit. */
export function parseBody<S extends z.ZodType>(schema: S, body: unknown): z.infer<S> {
  const result = schema.safeParse(body);
  if (!result.success) throw fieldErrors(toFieldErrors(result.error.issues));
  return result.data;
}
