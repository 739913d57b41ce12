import { ApiPropertyOptional, PartialType } from '@nestjs/swagger';
import { IsIn } from 'class-validator';
import { Omittable } from '../../common/validation-rules.js';
import { CreateProjectDto } from './create-project.dto.js';

/** Every field may be left out to keep its value; null is refused, never stored or taken as "left out". */
export class UpdateProjectDto extends PartialType(CreateProjectDto, { skipNullProperties: false }) {
  @ApiPropertyOptional({ enum: ['setup', 'fieldwork', 'closed'], enumName: 'ProjectStatus' })
  @Omittable()
  @IsIn(['setup', 'fieldwork', 'closed'], { message: 'status must be one of setup, fieldwork, closed' })
  status?: 'setup' | 'fieldwork' | 'closed';
}
