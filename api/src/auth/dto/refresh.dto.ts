import { ApiProperty } from '@nestjs/swagger';
import { IsString, MaxLength, MinLength } from 'class-validator';

export class RefreshDto {
  @ApiProperty({ description: 'The refresh token from the last sign-in or refresh' })
  @IsString()
  @MinLength(1, { message: 'refreshToken must not be empty' })
  @MaxLength(512)
  refreshToken: string;
}
