import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { IsInt, IsISO8601, IsOptional, IsString, IsTimeZone, Max, MaxLength, Min, MinLength } from 'class-validator';

export class CreateProjectDto {
  @ApiProperty({ example: 'Vellmoor tram extension' })
  @IsString()
  @MinLength(1, { message: 'name must not be empty' })
  @MaxLength(200)
  name: string;

  @ApiPropertyOptional({ example: 'Support for the eastern tram extension' })
  @IsOptional()
  @IsString()
  @MaxLength(2000)
  topic?: string;

  @ApiProperty({ example: '2026-11-16' })
  @IsISO8601({ strict: true }, { message: 'fieldStart must be a date like 2026-11-16' })
  fieldStart: string;

  @ApiProperty({ example: '2026-12-06' })
  @IsISO8601({ strict: true }, { message: 'fieldEnd must be a date like 2026-12-06' })
  fieldEnd: string;

  @ApiProperty({ example: 1200 })
  @IsInt({ message: 'targetSize must be a whole number' })
  @Min(1, { message: 'targetSize must be at least 1' })
  @Max(1_000_000)
  targetSize: number;

  @ApiProperty({ example: 'Do you support extending the tram line to the eastern villages?' })
  @IsString()
  @MinLength(1, { message: 'headlineQuestion must not be empty' })
  @MaxLength(500)
  headlineQuestion: string;

  @ApiPropertyOptional({ example: 'Europe/London', description: 'IANA time zone of the fieldwork; field days are counted in it. Default UTC.' })
  @IsOptional()
  @IsTimeZone({ message: 'timeZone must be a time zone name such as Europe/London' })
  timeZone?: string;
}
