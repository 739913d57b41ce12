import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { IsIn, IsObject, IsUUID, ValidateNested } from 'class-validator';
import { CalendarDate, ListOf, Name, Omittable } from '../../common/validation-rules.js';

export const DECISION_REASON_MAX = 500;
export const DECISION_IDS_MAX = 1000;

/** All interviews of one interviewer on one field day. */
export class DecisionSelectionDto {
  @ApiProperty({ format: 'uuid' })
  @IsUUID('all', { message: 'selection.interviewerId must be a user id' })
  interviewerId: string;

  @ApiProperty({ example: '2026-11-20' })
  @CalendarDate('selection.fieldDay', '2026-11-20')
  fieldDay: string;
}

/** A review decision on one or many interviews: listed by id, or all of one interviewer on one day. */
export class ReviewDecisionDto {
  @ApiProperty({ enum: ['approve', 'reject', 'reinstate'], description: 'reinstate puts a rejected interview back to awaiting review' })
  @IsIn(['approve', 'reject', 'reinstate'], { message: 'action must be approve, reject or reinstate' })
  action: 'approve' | 'reject' | 'reinstate';

  @ApiProperty({ description: `Why (1 to ${DECISION_REASON_MAX} characters); kept in the audit trail`, example: 'Timings confirmed with the interviewer' })
  @Name('reason', DECISION_REASON_MAX)
  reason: string;

  @ApiPropertyOptional({ type: [String], description: `Up to ${DECISION_IDS_MAX} interview ids (or give selection instead)` })
  @Omittable()
  @IsUUID('all', { each: true, message: 'each of interviewIds must be an interview id' })
  @ListOf('interviewIds', 1, DECISION_IDS_MAX, 'interview ids')
  interviewIds?: string[];

  @ApiPropertyOptional({ type: () => DecisionSelectionDto, description: 'Every interview of one interviewer on one field day (or give interviewIds instead)' })
  @Omittable()
  @IsObject({ message: 'selection must be an object with interviewerId and fieldDay' })
  @ValidateNested()
  @Type(() => DecisionSelectionDto)
  selection?: DecisionSelectionDto;
}
