import { ApiExtraModels, ApiProperty, getSchemaPath } from '@nestjs/swagger';
import { CellResponse } from '../../quotas/dto/cells-response.dto.js';
import { FLAG_CODES, type FlagCode } from '../flags.js';
import type { SyncReply } from '../sync.service.js';
import type { VoidResult } from '../void.service.js';

export class AcceptedItemResponse {
  @ApiProperty({ type: String, format: 'uuid', nullable: true, description: 'The id sent, in lower case' })
  id: string | null;

  @ApiProperty({ enum: ['accepted'] })
  status: 'accepted';

  @ApiProperty({ description: 'One of its cells was full or closed when it arrived' })
  overQuota: boolean;

  @ApiProperty({ type: String, format: 'uuid', isArray: true, description: 'The cells that were full or closed when it arrived (empty when not over quota)' })
  overQuotaCells: string[];

  @ApiProperty({ enum: FLAG_CODES, enumName: 'FlagCode', isArray: true, description: 'Kept but flagged for the supervisor' })
  flags: FlagCode[];
}

export class DuplicateItemResponse {
  @ApiProperty({ type: String, format: 'uuid', nullable: true })
  id: string | null;

  @ApiProperty({ enum: ['duplicate'], description: 'Already stored from this interviewer' })
  status: 'duplicate';
}

export class VoidedItemResponse {
  @ApiProperty({ type: String, format: 'uuid', nullable: true, description: 'The voided interview' })
  id: string | null;

  @ApiProperty({ enum: ['voided'], description: 'A void item: the interview no longer counts; voiding it again answers duplicate' })
  status: 'voided';
}

export class RejectedItemResponse {
  @ApiProperty({ type: String, nullable: true, description: 'The id sent, or null when it was unreadable' })
  id: string | null;

  @ApiProperty({ enum: ['rejected'] })
  status: 'rejected';

  @ApiProperty({ description: 'Why, in plain words for the interviewer' })
  reason: string;
}

const itemResults = [AcceptedItemResponse, DuplicateItemResponse, VoidedItemResponse, RejectedItemResponse];

@ApiExtraModels(...itemResults)
export class SyncReplyResponse implements SyncReply {
  @ApiProperty({
    type: 'array',
    items: { oneOf: itemResults.map((model) => ({ $ref: getSchemaPath(model) })) },
    description: 'One result per item, in the order sent',
  })
  results: (AcceptedItemResponse | DuplicateItemResponse | VoidedItemResponse | RejectedItemResponse)[];

  @ApiProperty()
  accepted: number;

  @ApiProperty()
  duplicates: number;

  @ApiProperty({ description: 'Void items that voided an interview' })
  voided: number;

  @ApiProperty()
  rejected: number;

  @ApiProperty({ type: () => [CellResponse], description: "The project's cells after the batch" })
  cells: CellResponse[];
}

export class VoidResultResponse implements VoidResult {
  @ApiProperty({ format: 'uuid' })
  id: string;

  @ApiProperty({ enum: ['voided', 'duplicate'], description: 'duplicate: it was already voided, nothing changed' })
  status: 'voided' | 'duplicate';
}
