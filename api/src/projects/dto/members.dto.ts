import { ApiProperty } from '@nestjs/swagger';
import { ArrayMaxSize, IsArray, IsUUID } from 'class-validator';

export class SetMembersDto {
  @ApiProperty({ type: [String], description: 'Everyone assigned to the project: interviewers, supervisors, clients' })
  @IsArray()
  @ArrayMaxSize(1000)
  @IsUUID('all', { each: true, message: 'each of userIds must be a user id' })
  userIds: string[];
}
