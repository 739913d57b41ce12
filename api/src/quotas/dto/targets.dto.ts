import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import {
  ArrayMaxSize,
  ArrayMinSize,
  IsArray,
  IsBoolean,
  IsNumber,
  IsOptional,
  IsString,
  MaxLength,
  Min,
  MinLength,
  ValidateNested,
} from 'class-validator';

export class TargetCategoryDto {
  @ApiProperty({ example: '18-34' })
  @IsString()
  @MinLength(1, { message: 'label must not be empty' })
  @MaxLength(100)
  label: string;

  @ApiProperty({ example: 0.27, description: 'Population share; any non-negative numbers, normalised per variable' })
  @IsNumber({ allowNaN: false, allowInfinity: false }, { message: 'share must be a number' })
  @Min(0, { message: 'share must not be negative' })
  share: number;
}

export class TargetVariableDto {
  @ApiProperty({ example: 'age band' })
  @IsString()
  @MinLength(1, { message: 'name must not be empty' })
  @MaxLength(100)
  name: string;

  @ApiPropertyOptional({ description: 'Interlocked variables form crossed cells; the rest are margin quotas' })
  @IsOptional()
  @IsBoolean()
  interlocked?: boolean;

  @ApiProperty({ type: [TargetCategoryDto] })
  @IsArray()
  @ArrayMinSize(1, { message: 'categories must list at least one category' })
  @ArrayMaxSize(100)
  @ValidateNested({ each: true })
  @Type(() => TargetCategoryDto)
  categories: TargetCategoryDto[];
}

export class JointShareDto {
  @ApiProperty({ example: ['18-24', 'female'], description: 'One category label per interlocked variable, in the order the variables are listed' })
  @IsArray()
  @ArrayMinSize(2, { message: 'categories must name one category of each interlocked variable' })
  @ArrayMaxSize(20)
  @IsString({ each: true })
  categories: string[];

  @ApiProperty({ example: 0.054, description: 'Joint population share; any non-negative numbers, normalised over the table' })
  @IsNumber({ allowNaN: false, allowInfinity: false }, { message: 'share must be a number' })
  @Min(0, { message: 'share must not be negative' })
  share: number;
}

export class SaveTargetsDto {
  @ApiProperty({ type: [TargetVariableDto] })
  @IsArray()
  @ArrayMinSize(1, { message: 'variables must list at least one quota variable' })
  @ArrayMaxSize(20)
  @ValidateNested({ each: true })
  @Type(() => TargetVariableDto)
  variables: TargetVariableDto[];

  @ApiPropertyOptional({
    type: [JointShareDto],
    description: 'Joint shares of the interlocked variables (every combination); without them cell targets are the product of the margins',
  })
  @IsOptional()
  @IsArray()
  @ArrayMaxSize(2000)
  @ValidateNested({ each: true })
  @Type(() => JointShareDto)
  jointShares?: JointShareDto[];
}
