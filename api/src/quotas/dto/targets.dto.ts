import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { IsBoolean, IsString, IsUUID, Matches, MaxLength, ValidateNested } from 'class-validator';
import { applyDecorators } from '@nestjs/common';
import { ListOf, Name, NoNul, NumberFrom, Omittable } from '../../common/validation-rules.js';
import { MAX_SHARE } from '../../formats/numbers.js';

/** File column names: lower-case letters, digits and underscores, starting with a letter. */
export const COLUMN_NAME = /^[a-z][a-z0-9_]*$/;

export class TargetCategoryDto {
  @ApiPropertyOptional({ format: 'uuid', description: 'The saved category this is (a rename keeps it); left out for a new category' })
  @Omittable()
  @IsUUID('all', { message: 'id must be the id of a saved category' })
  id?: string;

  @ApiProperty({ example: '18-34' })
  @Name('label', 100)
  label: string;

  @ApiProperty({ example: 0.27, description: 'Population share; any non-negative numbers, normalised per variable' })
  @NumberFrom('share', 0, MAX_SHARE)
  share: number;
}

export class TargetVariableDto {
  @ApiPropertyOptional({ format: 'uuid', description: 'The saved quota variable this is (a rename keeps it); left out for a new variable' })
  @Omittable()
  @IsUUID('all', { message: 'id must be the id of a saved quota variable' })
  id?: string;

  @ApiProperty({ example: 'Age band', description: 'Display name: what screens show' })
  @Name('name', 100)
  name: string;

  @ApiPropertyOptional({ example: 'age_band', description: 'Column name in targets files, exports and the command line; made from the name when left out' })
  @Omittable()
  @IsString({ message: 'columnName must be text' })
  @MaxLength(60, { message: 'columnName must be at most 60 characters long' })
  @Matches(COLUMN_NAME, { message: 'columnName must be lower-case letters, digits and underscores, starting with a letter (such as age_band)' })
  columnName?: string;

  @ApiPropertyOptional({ description: 'Interlocked variables form crossed cells; the rest are margin quotas' })
  @Omittable()
  @IsBoolean({ message: 'interlocked must be true or false' })
  interlocked?: boolean;

  @ApiProperty({ type: [TargetCategoryDto] })
  @ListOf('categories', 1, 100, 'categories')
  @ValidateNested({ each: true })
  @Type(() => TargetCategoryDto)
  categories: TargetCategoryDto[];
}

/** Each label of a joint row: text, at most 100 characters (as a category's label), no NUL character. */
function JointLabels(): PropertyDecorator {
  return applyDecorators(
    IsString({ each: true, message: 'each of categories must be a category label' }),
    MaxLength(100, { each: true, message: 'each of categories must be at most 100 characters long' }),
    NoNul('each of categories must not contain the NUL character', { each: true }),
  );
}

export class JointShareDto {
  @ApiProperty({ example: ['18-24', 'female'], description: 'One category label per interlocked variable, in the order the variables are listed' })
  @JointLabels()
  @ListOf('categories', 2, 20, 'category labels, one of each interlocked variable')
  categories: string[];

  @ApiProperty({ example: 0.054, description: 'Joint population share; any non-negative numbers, normalised over the table' })
  @NumberFrom('share', 0, MAX_SHARE)
  share: number;
}

export class SaveTargetsDto {
  @ApiProperty({ type: [TargetVariableDto] })
  @ListOf('variables', 1, 20, 'quota variables')
  @ValidateNested({ each: true })
  @Type(() => TargetVariableDto)
  variables: TargetVariableDto[];

  @ApiPropertyOptional({
    type: [JointShareDto],
    description: 'Joint shares of the interlocked variables (every combination); without them cell targets are the product of the margins',
  })
  @Omittable()
  @ListOf('jointShares', 0, 2000, 'combinations')
  @ValidateNested({ each: true })
  @Type(() => JointShareDto)
  jointShares?: JointShareDto[];
}
