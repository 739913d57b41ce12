import { ApiProperty } from '@nestjs/swagger';

export class PasswordSetResponse {
  @ApiProperty({ description: 'The account to sign in to with the new password' })
  email: string;
}
