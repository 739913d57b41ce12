import { ApiProperty } from '@nestjs/swagger';
import type { CountInterval } from '../../estimation/projection.js';
import type { ProjectedCell, Projection } from '../projection.service.js';

// docs/methods.md, "Projection to the end of fieldwork", defines every figure.

export class CountIntervalResponse implements CountInterval {
  @ApiProperty({ description: 'Expected count' })
  expected: number;

  @ApiProperty({ description: 'Lower end of the central interval at `level`' })
  lower: number;

  @ApiProperty({ description: 'Upper end of the central interval at `level`' })
  upper: number;
}

export class TargetDateResponse {
  @ApiProperty({ format: 'date', description: 'Today plus the completes still needed over the pace, rounded up' })
  expected: string;

  @ApiProperty({ format: 'date', description: 'The day by which the target is reached with probability (1 − level)/2' })
  earliest: string;

  @ApiProperty({ format: 'date', description: 'The day by which the target is reached with probability (1 + level)/2' })
  latest: string;
}

export class ProjectedCellResponse extends CountIntervalResponse implements ProjectedCell {
  @ApiProperty({ format: 'uuid' })
  id: string;

  @ApiProperty({ example: 'Women 18-34' })
  label: string;

  @ApiProperty()
  target: number;

  @ApiProperty({ description: 'Counted completes so far' })
  achieved: number;

  @ApiProperty({ description: 'Closed by the office: takes no more interviews' })
  closed: boolean;

  @ApiProperty({ description: "The cell's completes per field day over the window" })
  pacePerDay: number;

  @ApiProperty({ description: 'Probability that the cell ends below its target' })
  probabilityBelowTarget: number;

  @ApiProperty({ description: 'Ends below target with probability over 20%' })
  atRisk: boolean;
}

export class ProjectionResponse implements Projection {
  @ApiProperty({ format: 'uuid' })
  projectId: string;

  @ApiProperty({ example: 0.9, description: 'Level of the central intervals' })
  level: number;

  @ApiProperty({ format: 'date', description: "Today in the project's time zone" })
  asOf: string;

  @ApiProperty({ type: String, format: 'date', nullable: true, description: 'First field day of the pace window' })
  windowFrom: string | null;

  @ApiProperty({ type: String, format: 'date', nullable: true, description: 'Last field day of the pace window' })
  windowTo: string | null;

  @ApiProperty({ description: 'Full field days in the pace window (at most 7)' })
  windowDays: number;

  @ApiProperty({ type: String, format: 'date', nullable: true })
  fieldEnd: string | null;

  @ApiProperty({ type: Number, nullable: true, description: 'Field days from today to the field end, both counted; 0 after it' })
  daysLeft: number | null;

  @ApiProperty({ description: "The project's target number of completes" })
  target: number;

  @ApiProperty({ description: 'Counted completes so far' })
  completes: number;

  @ApiProperty({ description: 'Counted completes with today as their field day' })
  completesToday: number;

  @ApiProperty({ type: Number, nullable: true, description: 'Completes per field day over the window; null before a full field day' })
  pacePerDay: number | null;

  @ApiProperty({ type: () => CountIntervalResponse, nullable: true, description: 'The total at the field end; null without a field end or a pace' })
  atEnd: CountIntervalResponse | null;

  @ApiProperty({ type: Number, nullable: true, description: 'Probability that the total ends below target' })
  probabilityBelowTarget: number | null;

  @ApiProperty()
  targetReached: boolean;

  @ApiProperty({ type: () => TargetDateResponse, nullable: true, description: 'When the target is reached at the pace; null with no pace' })
  targetDate: TargetDateResponse | null;

  @ApiProperty({ type: () => [ProjectedCellResponse] })
  cells: ProjectedCellResponse[];

  @ApiProperty({ type: String, nullable: true, description: 'Why part or all of the projection is missing, in words for the lead' })
  problem: string | null;

  @ApiProperty({ format: 'date-time' })
  computedAt: string;
}
