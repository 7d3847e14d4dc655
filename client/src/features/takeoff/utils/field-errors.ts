import type { FieldError } from '@pondwright/shared/engine';

export type FieldErrorMap = Readonly<Record<string, string>>;

/**
 * The engine's dotted paths ("basins.0.shelves.1.depthIn") are already Mantine form paths; the map
 * keeps the first message per field.
 */
export function toFieldErrorMap(errors: readonly FieldError[]): FieldErrorMap {
  const map: Record<string, string> = {};
  for (const { field, message } of errors) map[field] ??= message;
  return map;
}

/** Errors at `path` itself or inside it, e.g. every error of `basins.0`. */
export function errorsWithin(errors: FieldErrorMap, path: string): string[] {
  return Object.keys(errors).filter((field) => field === path || field.startsWith(`${path}.`));
}
