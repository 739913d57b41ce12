import { ApiProperty } from '@nestjs/swagger';
import { ROLES, type Role } from '../../common/roles.js';
import type { ProjectRow } from '../../database/tables.js';
import type { ProjectListItem, ProjectMember, ProjectSummary } from '../projects.service.js';
import type { OwnAssignment, OwnProgress } from '../own-progress.js';

export const PROJECT_STATUSES = ['setup', 'fieldwork', 'closed'] as const satisfies readonly ProjectRow['status'][];

export class ProjectResponse implements ProjectSummary {
  @ApiProperty({ format: 'uuid' })
  id: string;

  @ApiProperty({ example: 'Vellmoor tram extension' })
  name: string;

  @ApiProperty({ description: 'Empty when not given' })
  topic: string;

  @ApiProperty({ type: String, format: 'date', nullable: true, example: '2026-11-16' })
  fieldStart: string | null;

  @ApiProperty({ type: String, format: 'date', nullable: true, example: '2026-12-06' })
  fieldEnd: string | null;

  @ApiProperty({ example: 1200 })
  targetSize: number;

  @ApiProperty({ enum: PROJECT_STATUSES, enumName: 'ProjectStatus' })
  status: ProjectRow['status'];

  @ApiProperty({ example: 'Do you support extending the tram line?' })
  headlineQuestion: string;

  @ApiProperty({ description: 'IANA time zone in which field days are counted', example: 'Europe/London' })
  timeZone: string;

  @ApiProperty({ type: String, format: 'date-time', nullable: true, description: 'When the project was archived; null while it is not' })
  archivedAt: string | null;
}

export class OwnAssignmentResponse implements OwnAssignment {
  @ApiProperty({ example: 150, description: 'Completes to reach' })
  target: number;

  @ApiProperty({ type: [String], description: 'Quota cells to work; empty: any cell' })
  cellIds: string[];
}

export class OwnProgressResponse implements OwnProgress {
  @ApiProperty({ format: 'date', example: '2026-11-20', description: 'The field day the today figures are for, in the project’s time zone' })
  fieldDay: string;

  @ApiProperty({ description: 'Contacts of any outcome logged on that day and received' })
  todayContacts: number;

  @ApiProperty({ description: 'Counted completes on that day' })
  todayCompletes: number;

  @ApiProperty({ description: 'Counted completes on the project so far' })
  completes: number;

  @ApiProperty({ type: OwnAssignmentResponse, nullable: true, description: 'Null when no assignment was given' })
  assignment: OwnAssignmentResponse | null;
}

export class ProjectListItemResponse extends ProjectResponse implements ProjectListItem {
  @ApiProperty({ type: OwnProgressResponse, nullable: true, description: 'The interviewer’s own figures; null for other roles' })
  mine: OwnProgressResponse | null;
}

export class ProjectMemberResponse implements ProjectMember {
  @ApiProperty({ format: 'uuid' })
  id: string;

  @ApiProperty()
  name: string;

  @ApiProperty()
  email: string;

  @ApiProperty({ enum: ROLES, enumName: 'Role' })
  role: Role;
}
