import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { IsTimeZone } from 'class-validator';
import { CalendarDate, FreeText, Name, Omittable, WholeNumber } from '../../common/validation-rules.js';

export class CreateProjectDto {
  @ApiProperty({ example: 'Vellmoor tram extension' })
  @Name('name', 200)
  name: string;

  @ApiPropertyOptional({ example: 'Support for the eastern tram extension' })
  @Omittable()
  @FreeText('topic', 2000)
  topic?: string;

  @ApiProperty({ example: '2026-11-16', format: 'date' })
  @CalendarDate('fieldStart', '2026-11-16')
  fieldStart: string;

  @ApiProperty({ example: '2026-12-06', format: 'date' })
  @CalendarDate('fieldEnd', '2026-12-06')
  fieldEnd: string;

  @ApiProperty({ example: 1200 })
  @WholeNumber('targetSize', 1, 1_000_000)
  targetSize: number;

  @ApiProperty({ example: 'Do you support extending the tram line to the eastern villages?' })
  @Name('headlineQuestion', 500)
  headlineQuestion: string;

  @ApiPropertyOptional({
    example: 'Europe/London',
    description: 'IANA time zone of the fieldwork, as the database knows it; field days are counted in it. Default UTC.',
  })
  @Omittable()
  @IsTimeZone({ message: 'timeZone must be a time zone name such as Europe/London' })
  timeZone?: string;
}
