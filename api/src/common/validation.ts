import { BadRequestException, ValidationError, ValidationPipe, type ValidationPipeOptions } from '@nestjs/common';
import { plainToInstance, type ClassConstructor } from 'class-transformer';
import { validateSync } from 'class-validator';

/** An error body lists at most this many problems, so a very wrong request gets a short answer. */
export const MAX_LISTED_PROBLEMS = 20;

export interface FieldProblem {
  field: string;
  message: string;
}

function flatten(errors: ValidationError[], parent = ''): FieldProblem[] {
  return errors.flatMap((error) => {
    const field = parent ? `${parent}.${error.property}` : error.property;
    const own = Object.values(error.constraints ?? {}).map((message) => ({ field, message }));
    return [...own, ...flatten(error.children ?? [], field)];
  });
}

/** The 400 for failed validation: each problem names its field; long lists are cut short and say how many more. */
export function validationFailed(errors: ValidationError[], locate: (p: FieldProblem) => FieldProblem = (p) => p): BadRequestException {
  const all = flatten(errors);
  const fields = all.slice(0, MAX_LISTED_PROBLEMS).map(locate);
  const more = all.length - fields.length;
  const message = (fields.map((f) => f.message).join('; ') || 'The request is not valid') + (more > 0 ? `; and ${more} more problems` : '');
  return new BadRequestException({ message, fields });
}

const OPTIONS = {
  whitelist: true,
  forbidNonWhitelisted: true,
  forbidUnknownValues: true,
  // One problem per field, the first rule it breaks (a null name is "must be text", not four messages).
  stopAtFirstError: true,
} as const;

/** Unknown fields are refused; each problem names its field. */
export function createValidationPipe(): ValidationPipe {
  const options: ValidationPipeOptions = { ...OPTIONS, transform: true, exceptionFactory: (errors) => validationFailed(errors) };
  return new ValidationPipe(options);
}

/**
 * Checks a plain value against a request DTO with exactly the global pipe's rules, for input
 * that arrives another way (a targets file): one set of rules whichever way data comes in.
 */
export function validateAs<T extends object>(cls: ClassConstructor<T>, plain: object, locate?: (p: FieldProblem) => FieldProblem): T {
  const instance = plainToInstance(cls, plain);
  const errors = validateSync(instance, OPTIONS);
  if (errors.length > 0) throw validationFailed(errors, locate);
  return instance;
}
