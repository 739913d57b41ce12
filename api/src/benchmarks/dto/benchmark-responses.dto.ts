import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import type { BenchmarkPoll } from '../benchmarks.service.js';
import type { ReconciledPoll } from '../reconciliation.service.js';
import { BIAS_KINDS, type BiasKind } from './benchmark-poll.dto.js';

// Shares and bias factors are proportions (0–1); docs/methods.md, "Benchmarks and reconciliation".

export class BenchmarkPollResponse implements BenchmarkPoll {
  @ApiProperty({ format: 'uuid' }) id: string;
  @ApiProperty() source: string;
  @ApiProperty({ example: '2026-11-20' }) fieldStart: string;
  @ApiProperty({ example: '2026-11-24' }) fieldEnd: string;
  @ApiProperty() yes: number;
  @ApiProperty() sampleSize: number;
  @ApiProperty({ description: 'yes / sampleSize' }) share: number;
  @ApiProperty() methodGroup: string;
  @ApiProperty({ enum: BIAS_KINDS }) groupBias: BiasKind;
  @ApiProperty({ type: Number, nullable: true }) biasFactor: number | null;
}

export class BenchmarkListResponse {
  @ApiProperty({ type: [BenchmarkPollResponse] }) polls: BenchmarkPollResponse[];
}

export class BiasSpecResponse {
  @ApiProperty({ enum: BIAS_KINDS }) kind: BiasKind;
  @ApiPropertyOptional({ description: 'The fixed factor of a known bias' }) factor?: number;
  @ApiPropertyOptional({ description: "Prior mean of an unknown group's factor" }) mean?: number;
  @ApiPropertyOptional({ description: "Prior standard deviation of an unknown group's factor" }) spread?: number;
}

export class ShareSummaryResponse {
  @ApiProperty() mean: number;
  @ApiProperty() median: number;
  @ApiProperty({ description: 'Lower end of the 95% interval' }) lower: number;
  @ApiProperty({ description: 'Upper end of the 95% interval' }) upper: number;
}

export class ReconciledGroupResponse {
  @ApiProperty() name: string;
  @ApiProperty({ type: BiasSpecResponse }) bias: BiasSpecResponse;
  @ApiProperty({ description: 'Posterior mean of the bias factor' }) meanFactor: number;
  @ApiProperty() lower: number;
  @ApiProperty() upper: number;
  @ApiProperty({ description: 'P(factor > 0.5): the group overstates the share' }) probOverstates: number;
  @ApiProperty({ description: 'P(factor < 0.5): the group understates the share' }) probUnderstates: number;
}

export class ReconciledPollResponse implements ReconciledPoll {
  @ApiProperty({ description: 'The poll id, or "project" for the project’s own figure' }) id: string;
  @ApiProperty() source: string;
  @ApiProperty() methodGroup: string;
  @ApiProperty({ description: 'Yes count used (for the project: w·n*, rounded)' }) successes: number;
  @ApiProperty({ description: 'Sample size used (for the project: n* = w(1−w)/SE², rounded)' }) trials: number;
  @ApiProperty() own: boolean;
  @ApiProperty() chanceOutlierProbability: number;
}

export class ReconciliationResponse {
  @ApiProperty({ description: "Standard deviation of an unknown group's bias factor used (the spread prior)" }) spread: number;
  @ApiProperty() defaultSpread: number;
  @ApiProperty({ type: String, nullable: true }) problem: string | null;
  @ApiProperty({ type: ShareSummaryResponse, nullable: true, description: 'The reconciled estimate of the true share' }) truth: ShareSummaryResponse | null;
  @ApiProperty({ type: [ReconciledGroupResponse] }) groups: ReconciledGroupResponse[];
  @ApiProperty({ type: [ReconciledPollResponse] }) polls: ReconciledPollResponse[];
  @ApiProperty({ type: [String] }) cautions: string[];
  @ApiProperty({ format: 'date-time' }) computedAt: string;
}
