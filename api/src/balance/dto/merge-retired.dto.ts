import { ApiProperty } from '@nestjs/swagger';
import { IsUUID, ValidateIf } from 'class-validator';

export class MergeRetiredDto {
  @ApiProperty({ type: String, format: 'uuid', nullable: true, description: 'A current category of the same variable, or null to leave the retired category out of weighting' })
  @ValidateIf((_, value) => value !== null)
  @IsUUID('all', { message: 'mergedInto must be a category id or null' })
  mergedInto: string | null;
}
