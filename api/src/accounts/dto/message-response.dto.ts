import { ApiProperty } from '@nestjs/swagger';

/** A request taken on: what happens next, in words for the person. */
export class MessageResponse {
  @ApiProperty({ example: 'If that address has an account, a link to choose a new password is on its way' })
  message: string;
}
