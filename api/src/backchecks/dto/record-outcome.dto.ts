import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { IsIn, ValidateBy, ValidateIf } from 'class-validator';
import { FreeText } from '../../common/validation-rules.js';

export const BACKCHECK_OUTCOMES = ['confirmed', 'not_confirmed', 'not_reached'] as const;
export type BackcheckOutcome = (typeof BACKCHECK_OUTCOMES)[number];

/** A not-confirmed back-check must say what differed. */
const SaysWhatDiffered = ValidateBy({
  name: 'saysWhatDiffered',
  validator: {
    validate: (value: unknown, args) =>
      (args?.object as { outcome?: unknown }).outcome !== 'not_confirmed' || (typeof value === 'string' && value.trim().length > 0),
    defaultMessage: () => 'note must say what differed from the interview when the back-check did not confirm it',
  },
});

export class RecordOutcomeDto {
  @ApiProperty({ enum: BACKCHECK_OUTCOMES, description: 'confirmed, not confirmed (note says what differed), or could not reach the respondent' })
  @IsIn(BACKCHECK_OUTCOMES, { message: `outcome must be one of ${BACKCHECK_OUTCOMES.join(', ')}` })
  outcome: BackcheckOutcome;

  @ApiPropertyOptional({ maxLength: 1000, description: 'What differed; required when the outcome is not_confirmed' })
  @ValidateIf((o: RecordOutcomeDto) => o.note !== undefined || o.outcome === 'not_confirmed')
  @FreeText('note', 1000)
  @SaysWhatDiffered
  note?: string;
}
