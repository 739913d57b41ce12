import { ApiProperty } from '@nestjs/swagger';
import { IsIn } from 'class-validator';
import { ROLES, type Role } from '../../common/roles.js';

export class ChangeRoleDto {
  @ApiProperty({ enum: ROLES })
  @IsIn(ROLES, { message: `role must be one of ${ROLES.join(', ')}` })
  role: Role;
}
