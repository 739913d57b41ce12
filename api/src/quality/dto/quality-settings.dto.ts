// The lead's quality rules as the API takes and gives them: every rule with its switch and
// thresholds (api/src/quality/quality-settings.ts). Bad input is refused whole (400).
import { ApiProperty } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { IsBoolean, IsNumber, Matches, Max, Min, ValidateBy, ValidateNested } from 'class-validator';
import { applyDecorators } from '@nestjs/common';
import { WholeNumber } from '../../common/validation-rules.js';
import type { QualitySettings } from '../quality-settings.js';

const Switch = () => IsBoolean({ message: 'enabled must be true or false' });

/** A number above `min` (exclusive) and up to `max` (inclusive unless `below`). */
function Between(field: string, min: number, max: number, below = false): PropertyDecorator {
  const words = `${field} must be more than ${min} and ${below ? 'less than' : 'at most'} ${max}`;
  return applyDecorators(
    IsNumber({ allowNaN: false, allowInfinity: false }, { message: `${field} must be a number` }),
    ValidateBy({ name: 'between', validator: { validate: (v: unknown) => typeof v === 'number' && v > min && (below ? v < max : v <= max) } }, { message: words }),
  );
}

const Clock = (field: string) => Matches(/^([01]\d|2[0-3]):[0-5]\d$/, { message: `${field} must be a time of day written HH:MM, such as 08:00` });

/** One rule's settings: an object (checked first), then each of its fields. */
function Nested<T>(field: string, type: () => new () => T): PropertyDecorator {
  const isObject = (v: unknown) => typeof v === 'object' && v !== null && !Array.isArray(v);
  return applyDecorators(ValidateBy({ name: 'isObject', validator: { validate: isObject } }, { message: `${field} must be an object with the rule's settings` }), ValidateNested(), Type(type));
}

export class TooShortDto {
  @ApiProperty() @Switch() enabled: boolean;
  @ApiProperty({ example: 0.333, description: 'A complete shorter than this share of the median complete is flagged' })
  @Between('fractionOfMedian', 0, 1) fractionOfMedian: number;
  @ApiProperty({ type: Number, nullable: true, example: null, description: 'Or shorter than this many minutes; null for no minimum' })
  @ValidateBy({ name: 'minutes', validator: { validate: (v: unknown) => v === null || (typeof v === 'number' && Number.isFinite(v) && v > 0 && v <= 600) } }, { message: 'minimumMinutes must be null or a number of minutes more than 0 and at most 600' })
  minimumMinutes: number | null;
}

export class SwitchOnlyDto {
  @ApiProperty() @Switch() enabled: boolean;
}

export class OutOfHoursDto {
  @ApiProperty() @Switch() enabled: boolean;
  @ApiProperty({ example: '08:00' }) @Clock('from') from: string;
  @ApiProperty({ example: '21:00' }) @Clock('to') to: string;
}

export class BurstsDto {
  @ApiProperty() @Switch() enabled: boolean;
  @ApiProperty({ example: 4, description: 'More completes than this by one interviewer within an hour are flagged' })
  @WholeNumber('perHour', 1, 100) perHour: number;
}

export class InterviewerAnswersDto {
  @ApiProperty() @Switch() enabled: boolean;
  @ApiProperty({ example: 20 }) @WholeNumber('minimumCompletes', 2, 100000) minimumCompletes: number;
  @ApiProperty({ example: 0.1, description: 'False discovery rate (Benjamini–Hochberg)' })
  @Between('falseDiscoveryRate', 0, 1, true) falseDiscoveryRate: number;
}

export class BackChecksDto {
  @ApiProperty() @Switch() enabled: boolean;
  @ApiProperty({ example: 0.1 }) @Between('share', 0, 1) share: number;
  @ApiProperty({ example: 0.1, description: 'Added to an interviewer’s share after a back-check does not confirm' })
  @Min(0, { message: 'raiseAfterNotConfirmed must be from 0 to 1' }) @Max(1, { message: 'raiseAfterNotConfirmed must be from 0 to 1' })
  @IsNumber({ allowNaN: false, allowInfinity: false }, { message: 'raiseAfterNotConfirmed must be a number' })
  raiseAfterNotConfirmed: number;
  @ApiProperty({ example: 30 }) @WholeNumber('keepReferenceDays', 1, 365) keepReferenceDays: number;
}

export class QualitySettingsDto implements QualitySettings {
  @ApiProperty({ type: TooShortDto }) @Nested('tooShort', () => TooShortDto) tooShort: TooShortDto;
  @ApiProperty({ type: SwitchOnlyDto }) @Nested('overlapping', () => SwitchOnlyDto) overlapping: SwitchOnlyDto;
  @ApiProperty({ type: OutOfHoursDto }) @Nested('outOfHours', () => OutOfHoursDto) outOfHours: OutOfHoursDto;
  @ApiProperty({ type: BurstsDto }) @Nested('bursts', () => BurstsDto) bursts: BurstsDto;
  @ApiProperty({ type: InterviewerAnswersDto }) @Nested('interviewerAnswers', () => InterviewerAnswersDto) interviewerAnswers: InterviewerAnswersDto;
  @ApiProperty({ type: BackChecksDto }) @Nested('backChecks', () => BackChecksDto) backChecks: BackChecksDto;
}

export class QualitySettingsResponse {
  @ApiProperty({ type: QualitySettingsDto, description: 'The project’s rules: its changes over the defaults' })
  settings: QualitySettingsDto;
  @ApiProperty({ type: QualitySettingsDto, description: 'What a rule is when the lead has not changed it' })
  defaults: QualitySettingsDto;
  @ApiProperty({ type: String, format: 'date-time', nullable: true, description: 'When the flags were last computed; null before the first run' })
  checkedAt: string | null;
}
