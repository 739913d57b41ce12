import { ApiProperty } from '@nestjs/swagger';
import { IsEmail, IsString, MaxLength, MinLength } from 'class-validator';

export class LoginDto {
  @ApiProperty({ example: 'lead@vellmoor.example' })
  @IsEmail({}, { message: 'email must be an e-mail address' })
  @MaxLength(254)
  email: string;

  @ApiProperty({ example: 'plumbline-demo' })
  @IsString()
  @MinLength(1, { message: 'password must not be empty' })
  @MaxLength(1024)
  password: string;
}
