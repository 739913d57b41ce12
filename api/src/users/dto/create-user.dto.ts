import { ApiProperty } from '@nestjs/swagger';
import { IsEmail, IsIn, MaxLength } from 'class-validator';
import { IsAcceptablePassword, PASSWORD_MIN_LENGTH } from '../../accounts/password-rule.js';
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

  @ApiProperty({ description: `At least ${PASSWORD_MIN_LENGTH} characters, not a commonly used password (the rule of every path that sets one)` })
  @IsAcceptablePassword()
  password: string;
}
