import { ApiProperty } from '@nestjs/swagger';
import type { InterviewerEffect } from '../interviewer-effect.js';

/** docs/methods.md, "Interviewer checks": on the headline answer minus its weighting cell's mean. */
export class InterviewerEffectResponse implements InterviewerEffect {
  @ApiProperty({ description: 'Intra-interviewer correlation ρ̂ (Kish 1962, one-way ANOVA), negative estimates set to 0' })
  rho: number;

  @ApiProperty({ description: 'ρ̂ before negative estimates are set to 0' })
  rawRho: number;

  @ApiProperty({ description: 'm₀ = (n − Σm_j²/n) / (J − 1)' })
  m0: number;

  @ApiProperty({ description: 'm* = Σm_j²/n, the workload-weighted mean workload' })
  mStar: number;

  @ApiProperty({ description: 'Interviewers with answers' })
  interviewers: number;

  @ApiProperty({ description: 'Weighted completes that answered yes or no' })
  interviews: number;

  @ApiProperty({ description: 'Interviewer design effect 1 + ρ̂·(m* − 1)' })
  designEffect: number;

  @ApiProperty({ type: Number, nullable: true, description: "Kish's weighting design effect × the interviewer design effect; null until weights are computed" })
  allSourcesDesignEffect: number | null;

  @ApiProperty({ type: Number, nullable: true, description: 'The interviews used over the all-sources design effect' })
  allSourcesEffectiveSampleSize: number | null;
}
