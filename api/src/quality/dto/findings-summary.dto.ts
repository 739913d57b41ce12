import { ApiProperty } from '@nestjs/swagger';
import type { FindingsSummary, InterviewerTestView, RuleCount } from '../findings-summary.service.js';
import { QUALITY_FLAG_CODES, type QualityFlagCode } from '../quality-flags.js';

export class RuleCountResponse implements RuleCount {
  @ApiProperty({ enum: QUALITY_FLAG_CODES, example: 'too_short' })
  code: QualityFlagCode;

  @ApiProperty({ example: 'Too short' })
  label: string;

  @ApiProperty({ description: 'One sentence saying what trips the flag' })
  explanation: string;

  @ApiProperty({ description: 'Interviews carrying the flag, approved ones left out' })
  interviews: number;
}

export class InterviewerTestResponse implements InterviewerTestView {
  @ApiProperty({ format: 'uuid' })
  interviewerId: string;

  @ApiProperty()
  name: string;

  @ApiProperty({ description: 'Counted completes that answered the headline question yes or no' })
  completes: number;

  @ApiProperty({ type: Number, nullable: true, description: 'Cochran–Mantel–Haenszel p-value; null when not tested' })
  pValue: number | null;

  @ApiProperty({ type: Number, nullable: true, description: 'Benjamini–Hochberg adjusted p-value; null when not tested' })
  adjustedPValue: number | null;

  @ApiProperty()
  flagged: boolean;

  @ApiProperty({ description: 'The result in words, with the figures behind it' })
  reason: string;
}

export class FindingsSummaryResponse implements FindingsSummary {
  @ApiProperty({ type: String, format: 'date-time', nullable: true, description: 'When the flags were last computed' })
  checkedAt: string | null;

  @ApiProperty({ type: () => [RuleCountResponse] })
  rules: RuleCountResponse[];

  @ApiProperty({ type: () => [InterviewerTestResponse] })
  interviewers: InterviewerTestResponse[];
}
