import { ApiProperty } from '@nestjs/swagger';
import { IsEmail, IsIn, IsString, Matches, MaxLength } from 'class-validator';
import { ROLES, type Role } from '../../common/roles.js';

export class InvitePersonDto {
  @ApiProperty({ example: 'new.interviewer@vellmoor.example' })
  @IsEmail({}, { message: 'email must be an e-mail address' })
  @MaxLength(254)
  email: string;

  @ApiProperty({ example: 'Ada Brennan' })
  @IsString()
  @Matches(/\S/, { message: 'name must not be empty' })
  @MaxLength(200)
  name: string;

  @ApiProperty({ enum: ROLES })
  @IsIn(ROLES, { message: `role must be one of ${ROLES.join(', ')}` })
  role: Role;
}
