import { ApiProperty } from '@nestjs/swagger';
import { HEADLINE_ANSWERS, type HeadlineAnswer } from '../../database/tables.js';
import { BACKCHECK_OUTCOMES, type BackcheckOutcome } from './record-outcome.dto.js';

export class BackcheckCategoryResponse {
  @ApiProperty() variable: string;
  @ApiProperty() category: string;
}

export class BackcheckResponse {
  @ApiProperty() interviewId: string;
  @ApiProperty() interviewerId: string;
  @ApiProperty() interviewerName: string;
  @ApiProperty({ example: '2026-11-20' }) fieldDay: string;
  @ApiProperty({ type: [BackcheckCategoryResponse] }) categories: BackcheckCategoryResponse[];
  @ApiProperty({ enum: HEADLINE_ANSWERS, nullable: true }) headlineAnswer: HeadlineAnswer | null;
  @ApiProperty({ nullable: true, type: String, description: 'Null when none was given or it was deleted (see referenceDeletedAt)' })
  respondentReference: string | null;
  @ApiProperty({ nullable: true, type: String, format: 'date-time' }) referenceDeletedAt: string | null;
  @ApiProperty({ description: "The interviewer's back-check share when the interview arrived" }) shareAtSelection: number;
  @ApiProperty({ format: 'date-time' }) selectedAt: string;
  @ApiProperty({ enum: BACKCHECK_OUTCOMES, nullable: true, description: 'Null while pending' }) outcome: BackcheckOutcome | null;
  @ApiProperty({ nullable: true, type: String }) outcomeNote: string | null;
  @ApiProperty({ nullable: true, type: String }) recordedByName: string | null;
  @ApiProperty({ nullable: true, type: String, format: 'date-time' }) recordedAt: string | null;
}

export class BackcheckListResponse {
  @ApiProperty({ type: [BackcheckResponse], description: 'Pending first (oldest selection first), then done (latest first)' })
  backchecks: BackcheckResponse[];
  @ApiProperty({ description: 'Share of completes selected' }) share: number;
  @ApiProperty({ description: "Added to an interviewer's share per not-confirmed back-check" }) raiseAfterNotConfirmed: number;
  @ApiProperty({ description: 'References are deleted this many days after the back-check' }) keepReferenceDays: number;
  @ApiProperty() enabled: boolean;
}

export class BackcheckSummaryResponse {
  @ApiProperty() interviewerId: string;
  @ApiProperty() interviewerName: string;
  @ApiProperty() selected: number;
  @ApiProperty() confirmed: number;
  @ApiProperty() notConfirmed: number;
  @ApiProperty() notReached: number;
  @ApiProperty() pending: number;
  @ApiProperty({ description: "The interviewer's share for completes arriving now" }) currentShare: number;
}
