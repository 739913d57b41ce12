import { ApiPropertyOptional } from '@nestjs/swagger';
import { Transform } from 'class-transformer';
import { Omittable, WholeNumber } from '../../common/validation-rules.js';

/** Each planned interview re-rakes once per open cell, so the plan is kept to a working day's size. */
export const NEXT_INTERVIEWS_MAX = 200;

export class NextInterviewsQuery {
  @ApiPropertyOptional({ type: Number, minimum: 1, maximum: NEXT_INTERVIEWS_MAX, description: 'Interviews to plan (default 50)' })
  @Omittable()
  @Transform(({ value }: { value: unknown }) => (typeof value === 'string' && /^\d+$/.test(value) ? Number(value) : value))
  @WholeNumber('count', 1, NEXT_INTERVIEWS_MAX)
  count?: number;
}
