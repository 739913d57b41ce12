import { ApiProperty } from '@nestjs/swagger';
import type { DecisionResult } from '../review-decisions.service.js';
import type { TrailEntry } from '../review-trail.service.js';
import { ReviewPersonResponse } from './review-response.dto.js';

const STATUSES = ['pending', 'approved', 'rejected'];
const ACTIONS = ['approve', 'reject', 'reinstate'];

export class DecidedInterviewResponse {
  @ApiProperty({ format: 'uuid' })
  id: string;

  @ApiProperty({ enum: STATUSES })
  previousStatus: 'pending' | 'approved' | 'rejected';

  @ApiProperty({ enum: STATUSES })
  newStatus: 'pending' | 'approved' | 'rejected';
}

export class DecisionResultResponse implements DecisionResult {
  @ApiProperty({ enum: ACTIONS })
  action: 'approve' | 'reject' | 'reinstate';

  @ApiProperty({ description: 'How many interviews the decision changed' })
  decided: number;

  @ApiProperty({ type: () => [DecidedInterviewResponse] })
  interviews: DecidedInterviewResponse[];
}

export class TrailEntryResponse implements TrailEntry {
  @ApiProperty({ description: 'Number of the decision in the audit trail' })
  id: string;

  @ApiProperty({ format: 'uuid' })
  interviewId: string;

  @ApiProperty({ enum: ACTIONS })
  action: 'approve' | 'reject' | 'reinstate';

  @ApiProperty({ enum: STATUSES })
  previousStatus: 'pending' | 'approved' | 'rejected';

  @ApiProperty({ enum: STATUSES })
  newStatus: 'pending' | 'approved' | 'rejected';

  @ApiProperty()
  reason: string;

  @ApiProperty({ type: () => ReviewPersonResponse })
  decidedBy: ReviewPersonResponse;

  @ApiProperty({ format: 'date-time' })
  decidedAt: string;
}
