import { ApiProperty } from '@nestjs/swagger';
import { IsUUID } from 'class-validator';
import { ListOf } from '../../common/validation-rules.js';

export class SetMembersDto {
  @ApiProperty({ type: [String], description: 'Everyone assigned to the project: interviewers, supervisors, clients' })
  @IsUUID('all', { each: true, message: 'each of userIds must be a user id' })
  @ListOf('userIds', 0, 1000, 'user ids')
  userIds: string[];
}
