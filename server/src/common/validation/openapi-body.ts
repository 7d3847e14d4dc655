import { z } from 'zod';

/** An OpenAPI body description generated from the shared zod schema the service validates with. */
export function openApiBody(schema: z.ZodType): object {
  return z.toJSONSchema(schema, { io: 'input', unrepresentable: 'any' }) as object;
}
