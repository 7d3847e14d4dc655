import { schemaResolver, useForm, type UseFormReturnType } from '@mantine/form';
import type { z } from 'zod';
import { ApiError } from './api-error';
import { notifyApiError } from './notify';

/**
 * A Mantine form validated by one of the shared zod schemas, the same schema the server
 * checks. Fields validate as the user types and when they leave the field.
 */
export function useSchemaForm<
  Schema extends z.ZodType<Record<string, unknown>, Record<string, unknown>>,
>(schema: Schema, initialValues: z.input<Schema>) {
  return useForm<z.input<Schema>, z.output<Schema>>({
    mode: 'controlled',
    initialValues,
    validate: schemaResolver(schema, { sync: true }),
    validateInputOnChange: true,
    validateInputOnBlur: true,
    transformValues: (values) => schema.parse(values),
  });
}

/**
 * Puts a failed submit where the user will see it: the server's per-field `details` on
 * the matching inputs (only those the form has), and its `message` in a notification.
 */
export function applyApiErrorToForm(
  form: Pick<UseFormReturnType<Record<string, unknown>>, 'getValues' | 'setErrors'>,
  error: unknown,
  title?: string,
): void {
  if (error instanceof ApiError && error.details.length > 0) {
    const fields = new Set(Object.keys(form.getValues()));
    const fieldErrors = Object.fromEntries(
      error.details
        .filter((detail) => fields.has(detail.field))
        .map((detail) => [detail.field, detail.message]),
    );
    form.setErrors(fieldErrors);
  }
  notifyApiError(error, title);
}
