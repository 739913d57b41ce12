import { ApiProperty } from '@nestjs/swagger';
import { IsString, MaxLength } from 'class-validator';
import { IsAcceptablePassword, PASSWORD_MIN_LENGTH } from '../password-rule.js';

export class SetPasswordDto {
  @ApiProperty({ description: 'The part of the link after "#token="' })
  @IsString()
  @MaxLength(200)
  token: string;

  @ApiProperty({ description: `At least ${PASSWORD_MIN_LENGTH} characters, not a commonly used password` })
  @IsAcceptablePassword()
  password: string;
}
