import { ApiProperty, ApiPropertyOptional, type ApiPropertyOptions } from '@nestjs/swagger';
import { WITHHELD_FIGURES, type WithheldFigure, type WithheldFigureName } from '../../estimation/withheld.js';
import type { OtherAnswerShare } from '../../estimation/weighting-summary.js';
import type { Balance, BalanceMargin, RetiredCategory } from '../balance.service.js';
import { InterviewerEffectResponse } from './interviewer-effect-response.dto.js';

// Shares are proportions (0–1) everywhere; docs/methods.md defines every figure.

export class BalanceMarginResponse implements BalanceMargin {
  @ApiProperty({ example: 'age band' })
  variable: string;

  @ApiProperty({ example: '18-24' })
  category: string;

  @ApiProperty({ description: 'Population share' })
  target: number;

  @ApiProperty({ description: 'Share among the counted completes' })
  unweighted: number;

  @ApiProperty({ type: Number, nullable: true, description: 'Share after raking; null until weights can be computed' })
  weighted: number | null;
}

export class MergeChoiceResponse {
  @ApiProperty({ format: 'uuid' })
  id: string;

  @ApiProperty({ example: 'Harbourside' })
  label: string;
}

export class RetiredCategoryResponse implements RetiredCategory {
  @ApiProperty({ format: 'uuid' })
  id: string;

  @ApiProperty({ example: 'District' })
  variable: string;

  @ApiProperty({ example: 'Harbour', description: 'The label the interviews were logged with' })
  category: string;

  @ApiProperty({ description: 'Counted interviews logged in it' })
  interviews: number;

  @ApiProperty({ type: String, format: 'uuid', nullable: true, description: 'The current category its interviews count as; null when they are not weighted' })
  mergedInto: string | null;

  @ApiProperty({ type: String, nullable: true, example: 'Harbourside' })
  mergedIntoLabel: string | null;

  @ApiProperty({ type: () => [MergeChoiceResponse], description: 'The current categories of the same variable it may be merged into' })
  choices: MergeChoiceResponse[];
}

const pair: ApiPropertyOptions = { type: [Number], minItems: 2, maxItems: 2, nullable: true };

/** Don't know or no answer, as a share of every counted complete (all are raked). */
export class OtherAnswerResponse implements OtherAnswerShare {
  @ApiProperty({ enum: ['dont_know', 'no_answer'], enumName: 'OtherAnswer' })
  answer: 'dont_know' | 'no_answer';

  @ApiProperty({ description: 'Counted completes giving this answer' })
  count: number;

  @ApiProperty({ description: 'Share of all counted completes used' })
  unweighted: number;

  @ApiProperty({ description: 'The same share after raking' })
  weighted: number;
}

/**
 * The headline share: yes among those who answered yes or no (a ratio); the weighted
 * figures are absent until weights can be computed.
 */
export class BalanceOutcomeResponse {
  @ApiProperty({ example: 'headline' })
  column: string;

  @ApiProperty({ description: 'Share of yes among those who answered yes or no' })
  unweighted: number;

  @ApiProperty({ description: 'Counted completes that answered yes or no (the share\'s base)' })
  answered: number;

  @ApiPropertyOptional({ description: 'Share of yes among those who answered, after raking every complete' })
  weighted?: number;

  @ApiPropertyOptional({ type: () => [OtherAnswerResponse], description: "Don't know and no answer, reported beside the share" })
  otherAnswers?: OtherAnswerResponse[];

  @ApiPropertyOptional({ type: Number, nullable: true, description: 'Standard error of the weighted share, a ratio estimator linearised through the raking' })
  standardError?: number | null;

  @ApiPropertyOptional({ ...pair, description: 'Korn–Graubard 95% interval [lower, upper] of the weighted share' })
  interval?: [number, number] | null;

  @ApiPropertyOptional({ description: 'How standardError and interval were computed' })
  method?: string;

  @ApiPropertyOptional({ type: Number, nullable: true, description: '1.96 standard errors; meaningful only when the interval is near symmetric' })
  marginOfError?: number | null;

  @ApiPropertyOptional({ type: Number, nullable: true })
  impliedBiasFactor?: number | null;

  @ApiPropertyOptional({ ...pair, description: "Interval of the implied bias factor" })
  impliedBiasFactorInterval?: [number, number] | null;

  @ApiPropertyOptional({ description: "How the bias factor's interval was computed" })
  impliedBiasFactorMethod?: string;
}

export class WithheldFigureResponse implements WithheldFigure {
  @ApiProperty({ enum: WITHHELD_FIGURES, enumName: 'WithheldFigureName' })
  figure: WithheldFigureName;

  @ApiProperty()
  reason: string;
}

const nullableNumber = { type: Number, nullable: true } as const;

export class BalanceResponse implements Balance {
  @ApiProperty({ format: 'uuid' })
  projectId: string;

  @ApiProperty()
  headlineQuestion: string;

  @ApiProperty({ description: 'Completed interviews used (not rejected, with a category on every current variable)' })
  n: number;

  @ApiProperty({ description: 'Completes left out because they lack a category of a variable added later' })
  excluded: number;

  @ApiProperty({ description: 'Completes left out of weighting because they were logged in a retired category not merged into a current one' })
  notWeighted: number;

  @ApiProperty({ type: () => [RetiredCategoryResponse], description: 'Retired categories of current variables that hold interviews' })
  retired: RetiredCategoryResponse[];

  @ApiProperty({ type: Boolean, nullable: true })
  converged: boolean | null;

  @ApiProperty(nullableNumber)
  iterations: number | null;

  @ApiProperty({ ...nullableNumber, description: "Kish's design effect of the weights" })
  designEffect: number | null;

  @ApiProperty(nullableNumber)
  effectiveSampleSize: number | null;

  @ApiProperty(nullableNumber)
  weightMin: number | null;

  @ApiProperty(nullableNumber)
  weightMax: number | null;

  @ApiProperty(nullableNumber)
  maxMarginError: number | null;

  @ApiProperty({ type: () => [BalanceMarginResponse] })
  margins: BalanceMarginResponse[];

  @ApiProperty({ type: () => BalanceOutcomeResponse, nullable: true, description: 'Null before the first counted complete' })
  outcome: BalanceOutcomeResponse | null;

  @ApiProperty({ type: String, nullable: true, description: 'Why no weights could be computed yet, in words for the lead; null when they were' })
  weightingProblem: string | null;

  @ApiProperty({ type: () => [WithheldFigureResponse], description: 'Figures not given because they cannot be trusted, each with its reason' })
  withheld: WithheldFigureResponse[];

  @ApiProperty({ type: () => InterviewerEffectResponse, nullable: true, description: 'Null with fewer than two interviewers with answers' })
  interviewerEffect: InterviewerEffectResponse | null;

  @ApiProperty({ format: 'date-time' })
  computedAt: string;
}
