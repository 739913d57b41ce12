import { ApiProperty } from '@nestjs/swagger';

export class LinkDetailsResponse {
  @ApiProperty({ enum: ['invitation', 'password_reset'] }) purpose: 'invitation' | 'password_reset';
  @ApiProperty() email: string;
  @ApiProperty() name: string;
  @ApiProperty({ description: "The organisation's name" }) organisation: string;
}
