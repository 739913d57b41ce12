import { ValidateBy } from 'class-validator';
import { referenceProblem } from '@plumbline/cell-rules/respondent-reference';

/** A respondent reference as the device's form checks it (the shared rule), with its reason as the message. */
export function RespondentReference(): PropertyDecorator {
  return ValidateBy({
    name: 'respondentReference',
    validator: {
      validate: (value: unknown) => referenceProblem(value) === null,
      defaultMessage: (args) => `respondentReference: ${referenceProblem(args?.value) ?? 'not acceptable'}`,
    },
  });
}
