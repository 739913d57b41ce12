import { ApiProperty } from '@nestjs/swagger';
import { IsIn, IsString } from 'class-validator';
import { Name } from '../../common/validation-rules.js';

export const VOID_REASON_MAX = 500;

/**
 * A sync item that voids an interview already sent (logged by mistake): sent in the same
 * `interviews` list as new contacts, told apart by `kind`. Checked on its own like any item.
 */
export class VoidItemDto {
  @ApiProperty({ enum: ['void'] })
  @IsIn(['void'], { message: 'kind must be void' })
  kind: 'void';

  @ApiProperty({ description: 'UUID of the interview to void, as the device made it' })
  @IsString({ message: 'id must be a UUID' })
  id: string;

  @ApiProperty({ description: `Why, in the interviewer's words (1 to ${VOID_REASON_MAX} characters)`, example: 'Logged twice by mistake' })
  @Name('reason', VOID_REASON_MAX)
  reason: string;
}

/** Body of a supervisor's void of one interview. */
export class VoidInterviewDto {
  @ApiProperty({ description: `Why (1 to ${VOID_REASON_MAX} characters)`, example: 'Respondent outside the survey population' })
  @Name('reason', VOID_REASON_MAX)
  reason: string;
}
