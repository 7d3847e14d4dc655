import { dictionary } from '@zxcvbn-ts/language-common';
import { registerDecorator, type ValidationOptions } from 'class-validator';

/**
 * NIST SP 800-63B §5.1.1.2 asks verifiers to refuse passwords found in lists of commonly used or breached
 * passwords. The list is the ~49,000-entry common-password dictionary that ships with zxcvbn-ts.
 */
const commonPasswords = new Set(
  (dictionary['passwords-common'] as string[]).map((password) => password.toLowerCase()),
);

export function isCommonPassword(password: string): boolean {
  return commonPasswords.has(password.toLowerCase());
}

export function IsNotCommonPassword(options?: ValidationOptions): PropertyDecorator {
  return (target, propertyName) => {
    registerDecorator({
      name: 'isNotCommonPassword',
      target: target.constructor,
      propertyName: String(propertyName),
      options,
      validator: {
        validate: (value: unknown) => typeof value !== 'string' || !isCommonPassword(value),
        defaultMessage: () => 'This password is too common. Choose one that is harder to guess.',
      },
    });
  };
}
