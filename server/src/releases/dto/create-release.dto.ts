import { IsDefined, IsISO8601, IsNumber, IsOptional, IsPositive, IsRFC3339, IsString, Max, MaxLength, MinLength } from 'class-validator';
import { MIN_REASON_LENGTH, type CreateReleaseRequest } from '@lockstep/shared';
import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Trim } from '../../common/validation/trim.decorator.js';

const finite = { allowNaN: false, allowInfinity: false };

export class CreateReleaseDto implements CreateReleaseRequest {
  @ApiProperty({ minimum: 0, exclusiveMinimum: true, example: 1, description: 'Concentration on the label: must match the order' })
  @IsPositive({ message: 'Concentration must be more than 0' })
  @IsNumber(finite, { message: 'Concentration must be a number' })
  @IsDefined({ message: 'Enter the concentration on the label' })
  concentrationPerMl: number;

  @ApiProperty({ minimum: 0, exclusiveMinimum: true, maximum: 100, example: 50, description: 'Syringe volume in mL' })
  @Max(100, { message: 'A PCA syringe holds at most 100 mL' })
  @IsPositive({ message: 'Volume must be more than 0' })
  @IsNumber(finite, { message: 'Volume must be a number of mL' })
  @IsDefined({ message: 'Enter the syringe volume in mL' })
  volumeMl: number;

  @ApiProperty({ minLength: 1, maxLength: 40, example: 'KB-77' })
  @Trim()
  @MaxLength(40, { message: 'Batch is at most 40 characters' })
  @MinLength(1, { message: 'Enter the batch' })
  @IsString({ message: 'Batch must be text' })
  @IsDefined({ message: 'Enter the batch' })
  batch: string;

  // ISO 8601 alone lets through week dates (2030-W01-1) and compact forms that Date cannot read.
  @ApiProperty({ format: 'date-time', example: '2030-01-01T12:00:00Z' })
  @IsRFC3339({ message: 'Enter the expiry as a date and time' })
  @IsISO8601({ strict: true }, { message: 'Enter the expiry as a date and time' })
  @IsDefined({ message: 'Enter the expiry' })
  expiresAt: string;

  @ApiProperty({ minLength: 1, maxLength: 120, example: 'Lin Park' })
  @Trim()
  @MaxLength(120, { message: 'At most 120 characters' })
  @MinLength(1, { message: 'Enter who prepared the syringe' })
  @IsString({ message: 'preparedBy must be text' })
  @IsDefined({ message: 'Enter who prepared the syringe' })
  preparedBy: string;

  @ApiProperty({ minLength: 1, maxLength: 120, example: 'Tomas Ortiz' })
  @Trim()
  @MaxLength(120, { message: 'At most 120 characters' })
  @MinLength(1, { message: 'Enter who checked the syringe' })
  @IsString({ message: 'checkedBy must be text' })
  @IsDefined({ message: 'Enter who checked the syringe' })
  checkedBy: string;

  @ApiPropertyOptional({
    minLength: MIN_REASON_LENGTH,
    maxLength: 1000,
    description: 'Needed for a syringe volume outside the usual 20 to 60 mL',
  })
  @Trim()
  @MaxLength(1000, { message: 'The reason is at most 1,000 characters' })
  @MinLength(MIN_REASON_LENGTH, { message: `Give a reason of at least ${MIN_REASON_LENGTH} characters` })
  @IsString({ message: 'overrideReason must be text' })
  @IsOptional()
  overrideReason?: string;

  @ApiPropertyOptional({
    minLength: MIN_REASON_LENGTH,
    maxLength: 1000,
    description: 'Needed when the order already has a ready or running syringe: why a second one is released',
  })
  @Trim()
  @MaxLength(1000, { message: 'The reason is at most 1,000 characters' })
  @MinLength(MIN_REASON_LENGTH, { message: `Give a reason of at least ${MIN_REASON_LENGTH} characters` })
  @IsString({ message: 'secondSyringeReason must be text' })
  @IsOptional()
  secondSyringeReason?: string;
}
