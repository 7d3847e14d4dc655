import { ApiBody, ApiResponse } from '@nestjs/swagger';
import type { z } from 'zod';
import { openApiBody } from '../validation/openapi-body';

/** A JSON request body, described by the shared zod schema the service validates it with. */
export function ApiZodBody(schema: z.ZodType): MethodDecorator {
  return ApiBody({ schema: openApiBody(schema) });
}

/**
 * A JSON answer named after its TypeScript type (`'JobView'`, or `'JobView[]'` for a list). The answer
 * types are plain types, not zod schemas, so the document names the type and says what the answer
 * holds instead of describing each large shape a second time by hand.
 */
export function ApiJsonResponse(
  status: number,
  type: string,
  description: string,
): MethodDecorator {
  const isList = type.endsWith('[]');
  const item = { type: 'object', title: isList ? type.slice(0, -2) : type };
  return ApiResponse({
    status,
    description,
    schema: isList ? { type: 'array', items: item } : item,
  });
}

/** A file answer (a PDF, a CSV, an image): its media type, and bytes. */
export function ApiFileResponse(mediaType: string, description: string): MethodDecorator {
  return ApiResponse({
    status: 200,
    description,
    content: { [mediaType]: { schema: { type: 'string', format: 'binary' } } },
  });
}

/** A multipart upload: the file's field and, if any, the other fields' zod schema. */
export function ApiUploadBody(fileField: string, fields?: z.ZodObject): MethodDecorator {
  const described = fields
    ? (openApiBody(fields) as { properties?: object; required?: string[] })
    : {};
  return ApiBody({
    schema: {
      type: 'object',
      properties: {
        [fileField]: { type: 'string', format: 'binary' },
        ...described.properties,
      },
      required: [fileField, ...(described.required ?? [])],
    },
  });
}
