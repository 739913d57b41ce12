import { ApiPropertyOptional } from '@nestjs/swagger';
import { IsIn } from 'class-validator';
import { Omittable } from '../../common/validation-rules.js';

export class ListProjectsQuery {
  @ApiPropertyOptional({ enum: ['true', 'false'], description: 'true: only archived projects; otherwise none of them' })
  @Omittable()
  @IsIn(['true', 'false'], { message: 'archived must be true or false' })
  archived?: 'true' | 'false';
}
