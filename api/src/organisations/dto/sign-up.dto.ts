import { ApiProperty } from '@nestjs/swagger';
import { IsEmail, IsString, Matches, MaxLength } from 'class-validator';

export class SignUpDto {
  @ApiProperty({ example: 'Harrowby Field Services' })
  @IsString()
  @Matches(/\S/, { message: 'organisation must not be empty' })
  @MaxLength(200)
  organisation: string;

  @ApiProperty({ example: 'Rhea Castell' })
  @IsString()
  @Matches(/\S/, { message: 'name must not be empty' })
  @MaxLength(200)
  name: string;

  @ApiProperty({ example: 'rhea@harrowby-field.example' })
  @IsEmail({}, { message: 'email must be an e-mail address' })
  @MaxLength(254)
  email: string;
}
