import { ApiProperty } from '@nestjs/swagger';

export class SignUpResponse {
  @ApiProperty({ example: 'Check your e-mail: the link in it confirms your address and lets you choose a password' })
  message: string;
}
