import { ApiPropertyOptional } from '@nestjs/swagger';
import { Transform } from 'class-transformer';
import { IsIn, IsString, IsUUID, Matches, MaxLength } from 'class-validator';
import { CalendarDate, Omittable, WholeNumber } from '../../common/validation-rules.js';
import { REVIEW_FLAG_CODES } from '../flag-labels.js';

export const REVIEW_PAGE_MAX = 200;

/** Filters and paging of the review queue (all optional). */
export class ReviewQueueQuery {
  @ApiPropertyOptional({ enum: REVIEW_FLAG_CODES, description: 'Only interviews carrying this flag' })
  @Omittable()
  @IsIn(REVIEW_FLAG_CODES, { message: `flag must be one of ${REVIEW_FLAG_CODES.join(', ')}` })
  flag?: string;

  @ApiPropertyOptional({ format: 'uuid', description: 'Only this interviewer\'s interviews' })
  @Omittable()
  @IsUUID('all', { message: 'interviewerId must be a user id' })
  interviewerId?: string;

  @ApiPropertyOptional({ example: '2026-11-20', description: 'Only interviews of this field day (YYYY-MM-DD)' })
  @Omittable()
  @CalendarDate('fieldDay', '2026-11-20')
  fieldDay?: string;

  @ApiPropertyOptional({ format: 'uuid', description: 'Only interviews in this quota cell (in all of its categories)' })
  @Omittable()
  @IsUUID('all', { message: 'cellId must be a cell id' })
  cellId?: string;

  @ApiPropertyOptional({ enum: ['pending', 'approved', 'rejected'] })
  @Omittable()
  @IsIn(['pending', 'approved', 'rejected'], { message: 'status must be pending, approved or rejected' })
  status?: 'pending' | 'approved' | 'rejected';

  @ApiPropertyOptional({ description: 'The nextCursor of the previous page' })
  @Omittable()
  @IsString({ message: 'after must be the nextCursor of a previous page' })
  @MaxLength(200, { message: 'after must be the nextCursor of a previous page' })
  @Matches(/^[\w-]+$/, { message: 'after must be the nextCursor of a previous page' })
  after?: string;

  @ApiPropertyOptional({ type: Number, minimum: 1, maximum: REVIEW_PAGE_MAX, description: 'Interviews per page (default 50)' })
  @Omittable()
  @Transform(({ value }: { value: unknown }) => (typeof value === 'string' && /^\d+$/.test(value) ? Number(value) : value))
  @WholeNumber('limit', 1, REVIEW_PAGE_MAX)
  limit?: number;
}
