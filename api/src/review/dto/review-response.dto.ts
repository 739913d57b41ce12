import { ApiProperty } from '@nestjs/swagger';
import type { Figure, ReviewFlag } from '../review-flags.js';
import type { ReviewItem, ReviewOptions, ReviewQueuePage } from '../review-queue.service.js';

export class FigureResponse implements Figure {
  @ApiProperty({ example: 'medianMinutes' })
  name: string;

  @ApiProperty({ oneOf: [{ type: 'number' }, { type: 'string' }], example: 14.5 })
  value: number | string;
}

export class ReviewFlagResponse implements ReviewFlag {
  @ApiProperty({ example: 'too_short', description: 'Flag code (arrival flags, over_quota, the rules, interviewer_answers, backcheck_not_confirmed)' })
  code: string;

  @ApiProperty({ example: 'Too short' })
  label: string;

  @ApiProperty({ example: 'Took 4.0 min; under a third of the median complete (14.5 min)' })
  reason: string;

  @ApiProperty({ type: () => [FigureResponse], description: 'The numbers behind the reason' })
  figures: FigureResponse[];
}

export class ReviewPersonResponse {
  @ApiProperty({ format: 'uuid' })
  id: string;

  @ApiProperty()
  name: string;
}

export class CategoryNameResponse {
  @ApiProperty({ example: 'Age band' })
  variable: string;

  @ApiProperty({ example: '18-34' })
  label: string;
}

export class ReviewItemResponse implements ReviewItem {
  @ApiProperty({ format: 'uuid' })
  id: string;

  @ApiProperty({ type: () => ReviewPersonResponse })
  interviewer: ReviewPersonResponse;

  @ApiProperty({ example: '2026-11-20' })
  fieldDay: string;

  @ApiProperty({ format: 'date-time' })
  startedAt: string;

  @ApiProperty({ format: 'date-time' })
  endedAt: string;

  @ApiProperty({ example: 900 })
  durationSeconds: number;

  @ApiProperty({ example: 'complete' })
  disposition: string;

  @ApiProperty({ type: () => [CategoryNameResponse] })
  categories: CategoryNameResponse[];

  @ApiProperty({ type: String, nullable: true, enum: ['yes', 'no', 'dont_know', 'no_answer'] })
  headlineAnswer: string | null;

  @ApiProperty({ enum: ['pending', 'approved', 'rejected'] })
  reviewStatus: 'pending' | 'approved' | 'rejected';

  @ApiProperty({ type: () => [ReviewFlagResponse], description: 'Empty for an approved interview' })
  flags: ReviewFlagResponse[];
}

export class ReviewQueueResponse implements ReviewQueuePage {
  @ApiProperty({ type: () => [ReviewItemResponse], description: 'Flagged interviews first, each group newest first' })
  items: ReviewItemResponse[];

  @ApiProperty({ type: String, nullable: true, description: 'Pass as `after` for the next page; null on the last page' })
  nextCursor: string | null;
}

export class FlagOptionResponse {
  @ApiProperty({ example: 'over_quota' })
  code: string;

  @ApiProperty({ example: 'Over quota' })
  label: string;

  @ApiProperty()
  explanation: string;
}

export class CellOptionResponse {
  @ApiProperty({ format: 'uuid' })
  id: string;

  @ApiProperty({ example: 'age: 18-34 × sex: female' })
  label: string;
}

export class ReviewOptionsResponse implements ReviewOptions {
  @ApiProperty({ type: () => [FlagOptionResponse] })
  flags: FlagOptionResponse[];

  @ApiProperty({ type: () => [ReviewPersonResponse], description: 'Interviewers with interviews in the project' })
  interviewers: ReviewPersonResponse[];

  @ApiProperty({ type: [String], description: 'Field days with interviews, newest first' })
  fieldDays: string[];

  @ApiProperty({ type: () => [CellOptionResponse] })
  cells: CellOptionResponse[];
}
