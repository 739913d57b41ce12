import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import type { VariableView } from '../cell-allocator.js';
import type { TargetsView } from '../targets.service.js';
import type { SaveTargetsDto } from './targets.dto.js';

export class QuotaCategoryResponse {
  @ApiProperty({ format: 'uuid' })
  id: string;

  @ApiProperty({ example: '18-24' })
  label: string;

  @ApiProperty({ description: 'Population share as saved (normalised per variable)', example: 0.12 })
  share: number;
}

/** An active quota variable with its categories (targets and cells alike). */
export class QuotaVariableResponse implements VariableView {
  @ApiProperty({ format: 'uuid' })
  id: string;

  @ApiProperty({ example: 'age band' })
  name: string;

  @ApiProperty({ description: 'Interlocked variables form crossed cells; the rest are margin quotas' })
  interlocked: boolean;

  @ApiProperty({ type: () => [QuotaCategoryResponse] })
  categories: QuotaCategoryResponse[];
}

export class JointShareResponse {
  @ApiProperty({ type: [String], example: ['18-24', 'female'], description: 'One category label per interlocked variable, in their order' })
  categories: string[];

  @ApiProperty({ example: 0.054 })
  share: number;
}

export const INTERLOCK_BASES = ['joint shares', 'product of margins'] as const;

export class TargetsResponse implements TargetsView {
  @ApiProperty({ type: () => [QuotaVariableResponse] })
  variables: QuotaVariableResponse[];

  @ApiProperty({ type: () => [JointShareResponse], description: 'Joint shares of the interlocked variables; empty when not given' })
  jointShares: JointShareResponse[];

  @ApiProperty({ enum: INTERLOCK_BASES, nullable: true, description: "Where the interlocked cells' targets come from; null when nothing is interlocked" })
  interlockBasis: (typeof INTERLOCK_BASES)[number] | null;
}

export class ParsedCategoryResponse {
  @ApiProperty({ example: '18-24' })
  label: string;

  @ApiProperty({ description: 'Share as written in the file', example: 0.12 })
  share: number;
}

export class ParsedVariableResponse {
  @ApiProperty({ example: 'age band' })
  name: string;

  @ApiProperty()
  interlocked: boolean;

  @ApiProperty({ type: () => [ParsedCategoryResponse] })
  categories: ParsedCategoryResponse[];
}

/** A targets file read for review, in the shape PUT targets takes; nothing is saved. */
export class ParsedTargetsResponse implements SaveTargetsDto {
  @ApiProperty({ type: () => [ParsedVariableResponse] })
  variables: ParsedVariableResponse[];

  @ApiPropertyOptional({ type: () => [JointShareResponse], description: 'Present when the file gives joint shares' })
  jointShares?: JointShareResponse[];
}
