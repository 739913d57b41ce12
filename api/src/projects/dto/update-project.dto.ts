import { ApiPropertyOptional, PartialType } from '@nestjs/swagger';
import { IsIn, IsOptional } from 'class-validator';
import { CreateProjectDto } from './create-project.dto.js';

export class UpdateProjectDto extends PartialType(CreateProjectDto) {
  @ApiPropertyOptional({ enum: ['setup', 'fieldwork', 'closed'], enumName: 'ProjectStatus' })
  @IsOptional()
  @IsIn(['setup', 'fieldwork', 'closed'], { message: 'status must be one of setup, fieldwork, closed' })
  status?: 'setup' | 'fieldwork' | 'closed';
}
