import { ApiProperty } from '@nestjs/swagger';
import type { DispositionCounts } from '../../estimation/outcome-rates.js';
import type { OutcomeMix, ShownRate } from '../interviewer-rates.js';
import type { InterviewerDay, InterviewerRates, ProjectInterviewerRates } from '../rates.service.js';

const count = (description: string) => ApiProperty({ type: 'integer', description });
const rate = (description: string) => ApiProperty({ type: 'number', nullable: true, description });

export class OutcomeMixResponse implements OutcomeMix {
  @count('Completes') complete: number;
  @count('Partials') partial: number;
  @count('Refusals') refusal: number;
  @count('Non-contacts') non_contact: number;
  @count('Other outcomes') other: number;
  @count('Not eligible') not_eligible: number;
  @count('Turned away: cell full') quota_full: number;
}

/** The AAPOR Standard Definitions' groups (api/src/interviewers/aapor-groups.ts). */
export class AaporGroupsResponse implements DispositionCounts {
  @count('Complete interviews') I: number;
  @count('Partial interviews') P: number;
  @count('Refusals') R: number;
  @count('Non-contacts where someone eligible is known to live') NC: number;
  @count('Other outcomes of known eligibility') O: number;
  @count('Non-contacts of unknown eligibility') UH: number;
  @count('Other outcomes of unknown eligibility') UO: number;
  @count('Not eligible, turned away because the cell was full included') NE: number;
}

export class ShownRatesResponse implements Record<ShownRate, number | null> {
  @rate('AAPOR COOP1: I / ((I+P) + R + O)') COOP1: number | null;
  @rate('AAPOR REF2: R / ((I+P) + (R+NC+O) + e(UH+UO))') REF2: number | null;
  @rate('AAPOR CON2: ((I+P)+R+O) / ((I+P)+R+O+NC + e(UH+UO))') CON2: number | null;
}

export class ContactFiguresResponse {
  @count('Contacts, neither voided nor rejected') contacts: number;
  @count('Counted completes') completes: number;
  @ApiProperty({ type: OutcomeMixResponse }) outcomes: OutcomeMixResponse;
  @ApiProperty({ type: AaporGroupsResponse }) groups: AaporGroupsResponse;
  @ApiProperty({ type: ShownRatesResponse }) rates: ShownRatesResponse;
}

export class InterviewerDayResponse extends ContactFiguresResponse implements InterviewerDay {
  @ApiProperty({ format: 'date', example: '2026-11-20' }) fieldDay: string;
  @ApiProperty({ type: 'number', nullable: true, description: 'Median length of the day’s counted completes, in seconds' })
  medianDurationSeconds: number | null;
}

export class InterviewerRuleCountResponse {
  @ApiProperty({ example: 'too_short' }) rule: string;
  @count('Interviews not approved that the rule found') count: number;
}

export class InterviewerAnswerTestResponse {
  @count('Completes tested') completes: number;
  @ApiProperty({ type: 'number', nullable: true }) pValue: number | null;
  @ApiProperty({ type: 'number', nullable: true, description: 'Benjamini–Hochberg adjusted' }) adjustedPValue: number | null;
  @ApiProperty() flagged: boolean;
  @ApiProperty() reason: string;
}

export class BackcheckTallyResponse {
  @count('Interviews selected for a back-check') selected: number;
  @count('Confirmed') confirmed: number;
  @count('Not confirmed') notConfirmed: number;
  @count('Could not reach') notReached: number;
  @count('No outcome yet') pending: number;
}

export class InterviewerRatesResponse extends ContactFiguresResponse implements InterviewerRates {
  @ApiProperty({ format: 'uuid' }) interviewerId: string;
  @ApiProperty({ example: 'Ada Fenwick' }) name: string;
  @ApiProperty({ type: 'number', nullable: true, description: 'Median length of counted completes, in seconds' })
  medianDurationSeconds: number | null;
  @ApiProperty({ type: [InterviewerRuleCountResponse] }) findings: InterviewerRuleCountResponse[];
  @ApiProperty({ type: InterviewerAnswerTestResponse, nullable: true }) test: InterviewerAnswerTestResponse | null;
  @ApiProperty({ type: BackcheckTallyResponse }) backchecks: BackcheckTallyResponse;
  @ApiProperty({ type: [InterviewerDayResponse] }) days: InterviewerDayResponse[];
}

export class ProjectInterviewerRatesResponse implements ProjectInterviewerRates {
  @ApiProperty({ format: 'uuid' }) projectId: string;
  @ApiProperty({ type: 'number', nullable: true, description: 'Eligible share of unknown-eligibility cases, estimated once from the whole project' })
  e: number | null;
  @ApiProperty({ enum: ['COOP1', 'REF2', 'CON2'], isArray: true }) rateNames: ShownRate[];
  @ApiProperty({ type: ContactFiguresResponse, description: 'The whole project' }) project: ContactFiguresResponse;
  @ApiProperty({ type: [InterviewerRatesResponse] }) interviewers: InterviewerRatesResponse[];
}
