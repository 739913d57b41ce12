import { ApiProperty } from '@nestjs/swagger';
import type { FlaggedInterviews } from '../flag-counts.service.js';

export class FlagCountResponse {
  @ApiProperty({ example: 'project_closed', description: 'A flag code (see FlagCode); older rows may carry codes no longer set' })
  code: string;

  @ApiProperty({ example: 'Sent after the project was closed' })
  reason: string;

  @ApiProperty()
  count: number;
}

export class FlaggedInterviewsResponse implements FlaggedInterviews {
  @ApiProperty({ description: 'Interviews with at least one flag; one interview may carry several' })
  total: number;

  @ApiProperty({ type: () => [FlagCountResponse] })
  byReason: FlagCountResponse[];
}
