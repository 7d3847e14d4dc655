import { BadRequestException } from '@nestjs/common';

/** A 400 in the one error shape, one message per field named by its dotted path. */
export function fieldErrors(
  details: Array<{ field: string; message: string }>,
): BadRequestException {
  return new BadRequestException({
    message: details.length === 1 ? details[0]!.message : 'Some fields need attention',
    details,
  });
}
