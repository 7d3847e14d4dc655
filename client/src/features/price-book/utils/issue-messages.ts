import type { z } from 'zod';

/** Plain words for the schema's generic number messages; the shared schema's own messages pass through. */
function issueMessage(issue: z.core.$ZodIssue): string {
  if (issue.code === 'invalid_type' && issue.expected === 'number') return 'Enter a number';
  if (issue.code === 'invalid_type' && issue.expected === 'string') return 'Fill this in';
  if (issue.code === 'too_small' && issue.origin === 'number') {
    return issue.inclusive ? `Enter ${issue.minimum} or more` : `Enter more than ${issue.minimum}`;
  }
  if (issue.code === 'too_big' && issue.origin === 'number') {
    return `Enter ${issue.maximum} or less`;
  }
  if (issue.code === 'invalid_value') return 'Choose one of the options';
  return issue.message;
}

/** A failed parse as one message per dotted path ("materials.3.unitCost"), the first issue winning. */
export function issuesByPath(error: z.ZodError | undefined): Record<string, string> {
  const byPath: Record<string, string> = {};
  for (const issue of error?.issues ?? []) {
    const path = issue.path.map(String).join('.');
    byPath[path] ??= issueMessage(issue);
  }
  return byPath;
}

/**
 * The server names fields by their place in the request (`book.materials.3.unitCost`); the
 * draft names them from the book.
 */
export function bookPath(serverField: string): string {
  return serverField.replace(/^book\./, '');
}
