import { BadRequestException, ValidationError, ValidationPipe } from '@nestjs/common';

/** Flattens class-validator's tree into one message per field, named by its dotted path. */
export function fieldDetails(
  errors: ValidationError[],
  parent = '',
): Array<{ field: string; message: string }> {
  return errors.flatMap((error) => {
    const field = parent ? `${parent}.${error.property}` : error.property;
    const own = error.constraints ? Object.values(error.constraints) : [];
    const first = own.length ? [{ field, message: own[own.length - 1]! }] : [];
    return [...first, ...fieldDetails(error.children ?? [], field)];
  });
}

/** The global pipe: unknown fields are refused, payloads become their DTO classes. */
export function createValidationPipe(): ValidationPipe {
  return new ValidationPipe({
    whitelist: true,
    forbidNonWhitelisted: true,
    transform: true,
    stopAtFirstError: true,
    exceptionFactory: (errors) => {
      const details = fieldDetails(errors);
      const message = details.length === 1 ? details[0]!.message : 'Some fields need attention';
      return new BadRequestException({ message, details });
    },
  });
}
