import { ApiProperty } from '@nestjs/swagger';
import { ROLES, type Role } from '../../common/roles.js';
import type { UserProfile } from '../../users/users.repository.js';
import type { Session } from '../auth.service.js';

export class OrganisationRefResponse {
  @ApiProperty({ format: 'uuid' })
  id: string;

  @ApiProperty({ example: 'Vellmoor Field Research' })
  name: string;
}

/** The signed-in person as sign-in, refresh and GET /auth/me give them. */
export class UserProfileResponse implements UserProfile {
  @ApiProperty({ format: 'uuid' })
  id: string;

  @ApiProperty({ example: 'lead@vellmoor.example' })
  email: string;

  @ApiProperty({ example: 'Lena Okafor' })
  name: string;

  @ApiProperty({ enum: ROLES, enumName: 'Role' })
  role: Role;

  @ApiProperty({ type: () => OrganisationRefResponse })
  organisation: OrganisationRefResponse;
}

export class SessionResponse implements Session {
  @ApiProperty({ description: 'HS256 JWT for the Authorization: Bearer header' })
  accessToken: string;

  @ApiProperty({ description: 'One-time refresh token (id.secret); rotated on every use' })
  refreshToken: string;

  @ApiProperty({ description: 'Seconds until the access token expires', example: 900 })
  expiresIn: number;

  @ApiProperty({ type: () => UserProfileResponse })
  user: UserProfileResponse;
}
