import { ApiProperty } from '@nestjs/swagger';
import { ROLES, type Role } from '../../common/roles.js';
import type { UserSummary } from '../users.repository.js';

/** An account of the organisation as the admin's list shows it. */
export class UserResponse implements UserSummary {
  @ApiProperty({ format: 'uuid' })
  id: string;

  @ApiProperty({ example: 'a.fenwick@vellmoor.example' })
  email: string;

  @ApiProperty({ example: 'Ada Fenwick' })
  name: string;

  @ApiProperty({ enum: ROLES, enumName: 'Role' })
  role: Role;

  @ApiProperty({ description: 'False when the account is disabled' })
  active: boolean;

  @ApiProperty({ enum: ['invited', 'active', 'disabled'], description: 'invited: has not set a password yet; disabled: may not sign in' })
  status: 'invited' | 'active' | 'disabled';

  @ApiProperty({ format: 'date-time' })
  createdAt: string;
}
