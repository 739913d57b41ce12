import { ApiProperty } from '@nestjs/swagger';
import type { Assignment } from '../assignments.service.js';

export class AssignmentResponse implements Assignment {
  @ApiProperty({ format: 'uuid', description: 'The interviewer' })
  userId: string;

  @ApiProperty({ example: 'Ada Fenwick' })
  name: string;

  @ApiProperty({ example: 150, description: 'Completes to reach' })
  target: number;

  @ApiProperty({ type: [String], description: 'Quota cells to work, in the cells’ order; empty: any cell' })
  cellIds: string[];

  @ApiProperty({ description: 'The interviewer’s counted completes on the project so far' })
  completes: number;

  @ApiProperty({ format: 'date-time' })
  updatedAt: string;
}
