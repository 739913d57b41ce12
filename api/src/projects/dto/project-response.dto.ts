import { ApiProperty } from '@nestjs/swagger';
import { ROLES, type Role } from '../../common/roles.js';
import type { ProjectRow } from '../../database/tables.js';
import type { ProjectMember, ProjectSummary } from '../projects.service.js';

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
