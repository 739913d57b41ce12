// The one rule for every password a person sets (invitation, reset, an admin creating an
// account): at least 12 characters, not only whitespace, and not a commonly used password.
// The list is @zxcvbn-ts/language-common's "passwords-common" dictionary (about 49,000
// passwords seen most often in breaches); NIST SP 800-63B section 5.1.1.2 asks for length
// over composition rules and a check against such a list.
import { dictionary } from '@zxcvbn-ts/language-common';
import { registerDecorator, type ValidationOptions } from 'class-validator';

export const PASSWORD_MIN_LENGTH = 12;
export const PASSWORD_MAX_LENGTH = 1024;

let common: Set<string> | null = null;
function commonPasswords(): Set<string> {
  common ??= new Set((dictionary['passwords-common'] as string[]).map((p) => p.toLowerCase()));
  return common;
}

/** A short unit repeated ("abcabcabcabc") or a listed password repeated ("passwordpassword"). */
function isRepetition(lower: string): boolean {
  const match = /^(.+?)\1+$/.exec(lower);
  if (!match) return false;
  const unit = match[1]!;
  return unit.length <= 4 || commonPasswords().has(unit);
}

/** Why a password is refused, in words for the person, or null when it is acceptable. */
export function passwordProblem(password: unknown): string | null {
  if (typeof password !== 'string') return 'password must be text';
  const length = [...password].length;
  if (length < PASSWORD_MIN_LENGTH) return `password must be at least ${PASSWORD_MIN_LENGTH} characters long`;
  if (length > PASSWORD_MAX_LENGTH) return `password must be at most ${PASSWORD_MAX_LENGTH} characters long`;
  if (password.trim() === '') return 'password must not be only spaces';
  const lower = password.trim().toLowerCase();
  if (commonPasswords().has(lower) || isRepetition(lower)) {
    return 'password is too common: it is on a list of passwords attackers try first; choose another';
  }
  return null;
}

/** class-validator decorator applying passwordProblem, for every DTO that sets a password. */
export function IsAcceptablePassword(options?: ValidationOptions): PropertyDecorator {
  return (target, propertyName) => {
    registerDecorator({
      name: 'isAcceptablePassword',
      target: target.constructor,
      propertyName: String(propertyName),
      options,
      validator: {
        validate: (value: unknown) => passwordProblem(value) === null,
        defaultMessage: (args) => passwordProblem(args?.value) ?? 'password is not acceptable',
      },
    });
  };
}
