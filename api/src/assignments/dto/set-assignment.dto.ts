import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { IsUUID } from 'class-validator';
import { ListOf, Omittable, WholeNumber } from '../../common/validation-rules.js';

export class SetAssignmentDto {
  @ApiProperty({ example: 150, description: 'Completes the interviewer is asked to reach on the project' })
  @WholeNumber('target', 1, 1_000_000)
  target: number;

  @ApiPropertyOptional({ type: [String], description: 'Quota cells to work (ids from the project’s cells); left out or empty: any cell' })
  @Omittable()
  @IsUUID('all', { each: true, message: 'each of cellIds must be a cell id' })
  @ListOf('cellIds', 0, 1000, 'cell ids')
  cellIds?: string[];
}
