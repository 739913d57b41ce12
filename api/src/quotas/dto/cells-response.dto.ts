import { ApiProperty } from '@nestjs/swagger';
import type { CellStatus } from '@plumbline/cell-rules';
import type { CellsView, CellView, InterviewerProgress } from '../cells.service.js';
import { QuotaVariableResponse } from './targets-response.dto.js';

export const CELL_STATUSES = ['open', 'nearly_full', 'full', 'closed'] as const satisfies readonly CellStatus[];

/** A quota cell with its counts, as cells, the quota board and every sync reply give it. */
export class CellResponse implements CellView {
  @ApiProperty({ format: 'uuid' })
  id: string;

  @ApiProperty({ enum: ['interlocked', 'margin'] })
  kind: 'interlocked' | 'margin';

  @ApiProperty({ example: '18-24 × female' })
  label: string;

  @ApiProperty({ type: [String], description: 'Category ids the cell stands for, one per variable it crosses' })
  categoryIds: string[];

  @ApiProperty({ example: 62 })
  target: number;

  @ApiProperty({ description: 'Counted interviews in the cell' })
  achieved: number;

  @ApiProperty({ description: 'Counted interviews that arrived after the cell was full' })
  overQuota: number;

  @ApiProperty()
  remaining: number;

  @ApiProperty({ description: 'achieved / target (1 for a zero target)' })
  fillRate: number;

  @ApiProperty({ enum: CELL_STATUSES, enumName: 'CellStatus' })
  status: CellStatus;

  @ApiProperty({ type: String, format: 'date-time', nullable: true })
  closedAt: string | null;
}

export class CellsResponse implements CellsView {
  @ApiProperty({ type: () => [QuotaVariableResponse] })
  variables: QuotaVariableResponse[];

  @ApiProperty({ type: () => [CellResponse] })
  cells: CellResponse[];

  @ApiProperty({ format: 'date-time' })
  refreshedAt: string;
}

/** The cells targets would give if saved, with the interviews already logged counted in them. */
export class TargetsPreviewResponse {
  @ApiProperty({ type: () => [CellResponse] })
  cells: CellResponse[];
}

export class InterviewerProgressResponse implements InterviewerProgress {
  @ApiProperty({ format: 'uuid' })
  id: string;

  @ApiProperty()
  name: string;

  @ApiProperty({ description: "Counted completes on the project's field day today" })
  completesToday: number;

  @ApiProperty()
  completesTotal: number;

  @ApiProperty()
  contactsTotal: number;

  @ApiProperty()
  overQuota: number;
}

export class QuotaBoardResponse {
  @ApiProperty({ format: 'uuid' })
  projectId: string;

  @ApiProperty()
  targetSize: number;

  @ApiProperty({ type: () => [CellResponse] })
  cells: CellResponse[];

  @ApiProperty({ type: () => [InterviewerProgressResponse] })
  interviewers: InterviewerProgressResponse[];

  @ApiProperty({ format: 'date-time' })
  refreshedAt: string;
}
