import { ApiProperty, ApiPropertyOptional, OmitType } from '@nestjs/swagger';
import type { VariableView } from '../cell-allocator.js';
import type { TargetVariableView, TargetsView } from '../targets.service.js';
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

  @ApiProperty({ example: 'Age band', description: 'Display name: what screens show' })
  name: string;

  @ApiProperty({ example: 'age_band', description: 'Column name in targets files, exports and the command line' })
  columnName: string;

  @ApiProperty({ description: 'Interlocked variables form crossed cells; the rest are margin quotas' })
  interlocked: boolean;

  @ApiProperty({ type: () => [QuotaCategoryResponse] })
  categories: QuotaCategoryResponse[];
}

export class TargetCategoryResponse extends QuotaCategoryResponse {
  @ApiProperty({ description: 'Counted interviews logged in this category so far', example: 12 })
  interviews: number;
}

/** A variable as the set-up screen edits it: with the interviews each category holds. */
export class TargetVariableResponse extends OmitType(QuotaVariableResponse, ['categories'] as const) implements TargetVariableView {
  @ApiProperty({ description: 'Counted interviews logged with this variable so far', example: 40 })
  interviews: number;

  @ApiProperty({ type: () => [TargetCategoryResponse] })
  categories: TargetCategoryResponse[];
}

export class JointShareResponse {
  @ApiProperty({ type: [String], example: ['18-24', 'female'], description: 'One category label per interlocked variable, in their order' })
  categories: string[];

  @ApiProperty({ example: 0.054 })
  share: number;
}

export const INTERLOCK_BASES = ['joint shares', 'product of margins'] as const;

export class TargetsResponse implements TargetsView {
  @ApiProperty({ type: () => [TargetVariableResponse] })
  variables: TargetVariableResponse[];

  @ApiProperty({ type: () => [JointShareResponse], description: 'Joint shares of the interlocked variables; empty when not given' })
  jointShares: JointShareResponse[];

  @ApiProperty({ enum: INTERLOCK_BASES, nullable: true, description: "Where the interlocked cells' targets come from; null when nothing is interlocked" })
  interlockBasis: (typeof INTERLOCK_BASES)[number] | null;
}

export class ParsedCategoryResponse {
  @ApiPropertyOptional({ format: 'uuid', description: 'The saved category of this label, when there is one' })
  id?: string;

  @ApiProperty({ example: '18-24' })
  label: string;

  @ApiProperty({ description: 'Share as written in the file', example: 0.12 })
  share: number;
}

export class ParsedVariableResponse {
  @ApiPropertyOptional({ format: 'uuid', description: 'The saved quota variable of this name, when there is one' })
  id?: string;

  @ApiProperty({ example: 'Age band', description: "The saved variable's display name, or the name in the file" })
  name: string;

  @ApiProperty({ example: 'age_band' })
  columnName: string;

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
