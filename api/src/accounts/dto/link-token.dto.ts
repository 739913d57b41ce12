import { ApiProperty } from '@nestjs/swagger';
import { IsString, MaxLength } from 'class-validator';

/** The token from a one-time link, sent in the body so it never appears in a URL or log. */
export class LinkTokenDto {
  @ApiProperty({ description: 'The part of the link after "#token="' })
  @IsString()
  @MaxLength(200)
  token: string;
}
