import { ApiProperty } from '@nestjs/swagger';

export class SignUpSettingsResponse {
  @ApiProperty({ description: 'Whether new organisations may sign up here (SIGNUP_ENABLED)' })
  enabled: boolean;
}
