import { ApiProperty } from '@nestjs/swagger';
import { VOIDED_LISTED, type FlaggedInterviews, type VoidedInterview } from '../flag-counts.service.js';

export class FlagCountResponse {
  @ApiProperty({ example: 'project_closed', description: 'A flag code (see FlagCode); older rows may carry codes no longer set' })
  code: string;

  @ApiProperty({ example: 'Sent after the project was closed' })
  reason: string;

  @ApiProperty()
  count: number;
}

export class VoidedInterviewResponse implements VoidedInterview {
  @ApiProperty({ format: 'uuid' })
  id: string;

  @ApiProperty({ example: 'complete' })
  disposition: string;

  @ApiProperty({ example: '2026-11-20', description: 'Field day of the interview (YYYY-MM-DD)' })
  fieldDay: string;

  @ApiProperty({ description: 'Name of the interviewer who logged it' })
  interviewer: string;

  @ApiProperty({ description: 'Name of whoever voided it (the interviewer or a supervisor)' })
  voidedBy: string;

  @ApiProperty({ format: 'date-time' })
  voidedAt: string;

  @ApiProperty({ example: 'Logged twice by mistake' })
  reason: string;
}

export class FlaggedInterviewsResponse implements FlaggedInterviews {
  @ApiProperty({ description: 'Interviews with at least one flag; one interview may carry several' })
  total: number;

  @ApiProperty({ type: () => [FlagCountResponse] })
  byReason: FlagCountResponse[];

  @ApiProperty({ type: () => [VoidedInterviewResponse], description: `The latest ${VOIDED_LISTED} voided interviews, newest first, with why` })
  voided: VoidedInterviewResponse[];
}
