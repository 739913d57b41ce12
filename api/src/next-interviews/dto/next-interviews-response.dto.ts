import { ApiProperty } from '@nestjs/swagger';
import type { CellGain, PlannedCell } from '../../estimation/next-interviews.js';
import type { NextInterviewsView } from '../next-interviews.service.js';

// docs/methods.md, "Where the next interviews help most", defines every figure.

export class CellGainResponse implements CellGain {
  @ApiProperty({ format: 'uuid' })
  id: string;

  @ApiProperty({ example: 'age: 60+ × sex: female' })
  label: string;

  @ApiProperty()
  target: number;

  @ApiProperty({ description: 'Counted interviews in the cell' })
  achieved: number;

  @ApiProperty({ description: 'target − achieved, at least 0' })
  remaining: number;

  @ApiProperty({ description: 'Change in the effective sample size from one more interview in the cell' })
  gain: number;

  @ApiProperty({ description: 'Change in the design effect from one more interview in the cell' })
  designEffectChange: number;
}

export class PlannedCellResponse implements PlannedCell {
  @ApiProperty({ format: 'uuid' })
  id: string;

  @ApiProperty({ example: 'age: 60+ × sex: female' })
  label: string;

  @ApiProperty({ description: 'Interviews of the plan in this cell' })
  interviews: number;
}

export class NextInterviewsResponse implements NextInterviewsView {
  @ApiProperty({ format: 'uuid' })
  projectId: string;

  @ApiProperty({ description: 'Interviews asked for' })
  count: number;

  @ApiProperty({ description: 'Completed interviews weighted now' })
  n: number;

  @ApiProperty({ type: Number, nullable: true, description: 'Kish effective sample size now; null while weights cannot be computed' })
  effectiveSampleSize: number | null;

  @ApiProperty({ type: Number, nullable: true })
  designEffect: number | null;

  @ApiProperty({ type: () => [PlannedCellResponse], description: 'The next interviews, chosen one at a time; most interviews first' })
  plan: PlannedCellResponse[];

  @ApiProperty({ description: 'Interviews in the plan; fewer than count when the open cells have less room' })
  planned: number;

  @ApiProperty({ type: Number, nullable: true, description: 'Kish effective sample size once the plan is done' })
  effectiveSampleSizeAfter: number | null;

  @ApiProperty({ type: () => [CellGainResponse], description: 'Open cells, best first, by the gain of one more interview now' })
  ranking: CellGainResponse[];

  @ApiProperty({ type: () => [CellGainResponse], description: 'Cells at or over target where one more interview raises the design effect' })
  costly: CellGainResponse[];

  @ApiProperty({ type: String, nullable: true, description: 'Why no plan can be made yet, in words for the supervisor' })
  problem: string | null;

  @ApiProperty({ format: 'date-time' })
  computedAt: string;
}
