import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { ArrayMaxSize, IsArray, IsBoolean, IsIn, IsString, IsObject, IsOptional } from 'class-validator';
import { RespondentReference } from '../../backchecks/dto/respondent-reference.js';
import { DISPOSITIONS, HEADLINE_ANSWERS, type Disposition, type HeadlineAnswer } from '../../database/tables.js';

export const SYNC_BATCH_LIMIT = 1000;

/** The whole batch is checked only for its shape; each interview is checked on its own. */
export class SyncBatchDto {
  @ApiProperty({
    type: 'array',
    items: { type: 'object' },
    description: `Up to ${SYNC_BATCH_LIMIT} items: new interviews (InterviewItemDto), or voids of interviews already sent ({ kind: "void", id, reason }: VoidItemDto)`,
  })
  @IsArray({ message: 'interviews must be a list' })
  @ArrayMaxSize(SYNC_BATCH_LIMIT, { message: `interviews may hold at most ${SYNC_BATCH_LIMIT} items per batch` })
  interviews: unknown[];
}

export class InterviewItemDto {
  @ApiProperty({ description: 'UUID made on the device when the contact was logged; compared case-insensitively' })
  @IsString({ message: 'id must be a UUID' })
  id: string;

  @ApiProperty({ enum: DISPOSITIONS })
  @IsIn(DISPOSITIONS, { message: `disposition must be one of ${DISPOSITIONS.join(', ')}` })
  disposition: Disposition;

  @ApiPropertyOptional({ description: 'Quota variable id → category id; required for a complete' })
  @IsOptional()
  @IsObject({ message: 'categories must map variable ids to category ids' })
  categories?: Record<string, unknown>;

  @ApiPropertyOptional({
    oneOf: [{ type: 'string', enum: [...HEADLINE_ANSWERS] }, { type: 'boolean' }],
    description: 'Answer to the headline question; required for a complete. true and false (from devices before don\'t know and no answer) are read as yes and no',
  })
  @IsOptional()
  @IsIn([...HEADLINE_ANSWERS, true, false], { message: `headlineAnswer must be one of ${HEADLINE_ANSWERS.join(', ')}` })
  headlineAnswer?: HeadlineAnswer | boolean;

  @ApiPropertyOptional({ description: 'Non-contacts and other outcomes only: true when someone eligible is known to live there; left out or false when that is unknown' })
  @IsOptional()
  @IsBoolean({ message: 'eligibilityKnown must be true or false' })
  eligibilityKnown?: boolean;

  // Read in full (RFC 3339, plausible year) by item-check.ts, which names what is wrong.
  @ApiProperty({ example: '2026-11-20T10:02:00Z', description: 'RFC 3339 date and time with Z or an offset' })
  @IsString({ message: 'startedAt must be a date and time such as 2026-11-20T10:02:00Z' })
  startedAt: string;

  @ApiProperty({ example: '2026-11-20T10:19:00Z', description: 'RFC 3339 date and time with Z or an offset' })
  @IsString({ message: 'endedAt must be a date and time such as 2026-11-20T10:02:00Z' })
  endedAt: string;

  @ApiPropertyOptional({
    maxLength: 20,
    example: 'VM-0412',
    description:
      "A code from the agency's own contact sheet (1–20 letters, digits, '-', '_', '/'), never a name, address, e-mail or phone number. Kept only if the interview is selected for a back-check, else dropped",
  })
  @IsOptional()
  @RespondentReference()
  respondentReference?: string;
}
