import { ApiProperty } from '@nestjs/swagger';
import { ROLES, type Role } from '../../common/roles.js';

export class PersonResponse {
  @ApiProperty({ format: 'uuid' }) id: string;
  @ApiProperty() email: string;
  @ApiProperty() name: string;
  @ApiProperty({ enum: ROLES }) role: Role;
  @ApiProperty({ description: 'False once disabled' }) active: boolean;
  @ApiProperty({ enum: ['invited', 'active', 'disabled'], description: 'invited: has not set a password yet' })
  status: 'invited' | 'active' | 'disabled';
  @ApiProperty({ format: 'date-time' }) createdAt: string;
}
