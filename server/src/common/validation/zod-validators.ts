import {
  registerDecorator,
  type ValidationArguments,
  type ValidationOptions,
} from 'class-validator';
import { Transform } from 'class-transformer';
import type { z } from 'zod';

/**
 * Binds a class-validator property to a zod schema from @pondwright/shared, so the HTTP edge and the
 * client's forms apply one rule with one message instead of two hand-written copies. A valid value is
 * replaced by the schema's output (trimmed, normalised).
 */
export function MatchesSchema(schema: z.ZodType, options?: ValidationOptions): PropertyDecorator {
  const normalise = Transform(({ value }: { value: unknown }) => {
    const result = schema.safeParse(value);
    return result.success ? result.data : value;
  });
  return (target, propertyName) => {
    normalise(target, propertyName);
    registerDecorator({
      name: 'matchesSchema',
      target: target.constructor,
      propertyName: String(propertyName),
      options,
      validator: {
        validate: (value: unknown) => schema.safeParse(value).success,
        defaultMessage: (args: ValidationArguments) => {
          const result = schema.safeParse(args.value);
          return result.success
            ? ''
            : (result.error.issues[0]?.message ?? `${args.property} is not valid`);
        },
      },
    });
  };
}
