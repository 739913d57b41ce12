// The rules request DTOs share, so a name, a label or a date means the same everywhere
// (in a JSON body and in a targets file alike: common/validation.ts `validateAs`).
// Validation stops at a field's first broken rule (common/validation.ts), and rules run in the
// order they are registered: inside one of these in the order listed, so the type comes first
// and null given for a number reads "must be a whole number", never "must be at most 1000000";
// among decorators stacked on a property the one written lowest runs first.
import { applyDecorators } from '@nestjs/common';
import { Transform } from 'class-transformer';
import { ArrayMaxSize, ArrayMinSize, IsArray, IsInt, IsNumber, IsString, Max, MaxLength, Min, MinLength, ValidateBy, ValidateIf, type ValidationOptions } from 'class-validator';
import { isCalendarDate } from '../formats/dates.js';

const trim = Transform(({ value }: { value: unknown }) => (typeof value === 'string' ? value.trim() : value));

/** Text without the NUL character, which PostgreSQL text cannot store. */
export function NoNul(message: string, options?: ValidationOptions): PropertyDecorator {
  return ValidateBy(
    { name: 'noNul', validator: { validate: (value: unknown) => typeof value !== 'string' || !value.includes('\u0000') } },
    { message, ...options },
  );
}

/**
 * A name or label: trimmed, then it must still hold something, at most `max` characters, and no
 * NUL character (PostgreSQL text cannot store one).
 */
export function Name(field: string, max: number): PropertyDecorator {
  return applyDecorators(
    trim,
    IsString({ message: `${field} must be text` }),
    MinLength(1, { message: `${field} must not be empty or only spaces` }),
    MaxLength(max, { message: `${field} must be at most ${max} characters long` }),
    NoNul(`${field} must not contain the NUL character`),
  );
}

/** Free text that may be empty: trimmed, at most `max` characters, no NUL character. */
export function FreeText(field: string, max: number): PropertyDecorator {
  return applyDecorators(
    trim,
    IsString({ message: `${field} must be text` }),
    MaxLength(max, { message: `${field} must be at most ${max} characters long` }),
    NoNul(`${field} must not contain the NUL character`),
  );
}

/** A whole number from `min` to `max`. */
export function WholeNumber(field: string, min: number, max: number): PropertyDecorator {
  return applyDecorators(
    IsInt({ message: `${field} must be a whole number` }),
    Min(min, { message: `${field} must be at least ${min}` }),
    Max(max, { message: `${field} must be at most ${max}` }),
  );
}

/** A finite number from `min` to `max`. */
export function NumberFrom(field: string, min: number, max: number): PropertyDecorator {
  return applyDecorators(
    IsNumber({ allowNaN: false, allowInfinity: false }, { message: `${field} must be a number` }),
    Min(min, { message: min === 0 ? `${field} must not be negative` : `${field} must be at least ${min}` }),
    Max(max, { message: `${field} must be at most ${max}` }),
  );
}

/** A list of `min` to `max` items (what each item must be is said beside it). */
export function ListOf(field: string, min: number, max: number, items: string): PropertyDecorator {
  return applyDecorators(
    IsArray({ message: `${field} must be a list of ${items}` }),
    ArrayMinSize(min, { message: `${field} must list at least ${min} ${items}` }),
    ArrayMaxSize(max, { message: `${field} may list at most ${max} ${items}` }),
  );
}

/** A calendar date written YYYY-MM-DD (formats/dates.ts). */
export function CalendarDate(field: string, example: string, options?: ValidationOptions): PropertyDecorator {
  return ValidateBy(
    { name: 'isCalendarDate', validator: { validate: (value: unknown) => isCalendarDate(value) } },
    { message: `${field} must be a calendar date written YYYY-MM-DD, such as ${example}`, ...options },
  );
}

/**
 * May be left out, but when given it is checked like any value: null is refused rather than
 * taken as "left out" (class-validator's IsOptional lets null through to the service).
 */
export function Omittable(): PropertyDecorator {
  return ValidateIf((_object, value) => value !== undefined);
}
