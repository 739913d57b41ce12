import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { IsIn } from 'class-validator';
import { CalendarDate, Name, NumberFrom, Omittable, WholeNumber } from '../../common/validation-rules.js';

export const BIAS_KINDS = ['none', 'known', 'unknown'] as const;
export type BiasKind = (typeof BIAS_KINDS)[number];

/** Another poll on the headline question. Give the share or the yes count, not both. */
export class BenchmarkPollDto {
  @ApiProperty({ example: 'Vellmoor Courier poll' })
  @Name('source', 200)
  source: string;

  @ApiProperty({ example: '2026-11-20' })
  @CalendarDate('fieldStart', '2026-11-20')
  fieldStart: string;

  @ApiProperty({ example: '2026-11-24' })
  @CalendarDate('fieldEnd', '2026-11-24')
  fieldEnd: string;

  @ApiPropertyOptional({ description: 'Share who said yes, a proportion (0–1); the yes count is its share of the sample, rounded' })
  @Omittable()
  @NumberFrom('share', 0, 1)
  share?: number;

  @ApiPropertyOptional({ description: 'How many said yes' })
  @Omittable()
  @WholeNumber('yes', 0, 10_000_000)
  yes?: number;

  @ApiProperty({ example: 800 })
  @WholeNumber('sampleSize', 1, 10_000_000)
  sampleSize: number;

  @ApiProperty({ example: 'Online panel', description: 'Polls of one method group share one bias factor' })
  @Name('methodGroup', 100)
  methodGroup: string;

  @ApiProperty({ enum: BIAS_KINDS, description: "What is known of the method group's bias; applies to every poll of the group" })
  @IsIn(BIAS_KINDS, { message: 'groupBias must be one of none, known, unknown' })
  groupBias: BiasKind;

  @ApiPropertyOptional({ description: 'The known bias factor (0–1, 0.5 is no bias); only with groupBias "known"' })
  @Omittable()
  @NumberFrom('biasFactor', 0, 1)
  biasFactor?: number;
}

export class ReconciliationSettingsDto {
  @ApiProperty({ example: 0.04, description: "Standard deviation of an unknown group's bias factor around 0.5 (its prior); 0.001 to 0.2" })
  @NumberFrom('spread', 0.001, 0.2)
  spread: number;
}
