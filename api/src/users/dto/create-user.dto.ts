import { ApiProperty } from '@nestjs/swagger';
import { IsEmail, IsIn, IsString, MaxLength, MinLength } from 'class-validator';
import { ROLES, type Role } from '../../common/roles.js';
import { Name } from '../../common/validation-rules.js';

export class CreateUserDto {
  @ApiProperty({ example: 'new.interviewer@vellmoor.example' })
  @IsEmail({}, { message: 'email must be an e-mail address' })
  @MaxLength(254)
  email: string;

  @ApiProperty({ example: 'Ada Brennan' })
  @Name('name', 200)
  name: string;

  @ApiProperty({ enum: ROLES })
  @IsIn(ROLES, { message: `role must be one of ${ROLES.join(', ')}` })
  role: Role;

  @ApiProperty({ description: 'At least 10 characters' })
  @IsString()
  @MinLength(10, { message: 'password must be at least 10 characters long' })
  @MaxLength(1024)
  password: string;
}
