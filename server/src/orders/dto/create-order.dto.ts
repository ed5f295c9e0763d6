import { Type } from 'class-transformer';
import {
  ArrayMaxSize,
  IsArray,
  IsDefined,
  IsISO8601,
  IsObject,
  IsString,
  Matches,
  MaxLength,
  MinLength,
  ValidateNested,
} from 'class-validator';
import { MIN_REASON_LENGTH, type CreateOrderRequest, type Override } from '@lockstep/shared';
import { ApiProperty } from '@nestjs/swagger';
import { SignatureDto } from '../../common/dto/signature.dto.js';
import { Trim } from '../../common/validation/trim.decorator.js';
import { OrderFieldsDto } from './order-fields.dto.js';

export class OverrideDto implements Override {
  @ApiProperty({ maxLength: 64, example: 'demandDose', description: 'The order field outside a soft limit' })
  @MaxLength(64, { message: 'field is at most 64 characters' })
  @IsString({ message: 'field must name the order field' })
  @IsDefined({ message: 'field is required' })
  field: string;

  @ApiProperty({
    minLength: MIN_REASON_LENGTH,
    maxLength: 1000,
    example: 'Opioid-tolerant patient, agreed with the pain team',
    description: 'Why the value is right for this patient',
  })
  @Trim()
  @MaxLength(1000, { message: 'The reason is at most 1,000 characters' })
  @MinLength(MIN_REASON_LENGTH, { message: `Give a reason of at least ${MIN_REASON_LENGTH} characters` })
  @IsString({ message: 'reason must be text' })
  @IsDefined({ message: 'Give a reason for going past the soft limit' })
  reason: string;
}

export class CreateOrderDto extends OrderFieldsDto implements CreateOrderRequest {
  // ISO 8601 alone also takes 2030, 2030-W01-1 or a date and time.
  @ApiProperty({
    format: 'date',
    pattern: '^\\d{4}-\\d{2}-\\d{2}$',
    example: '2030-01-02',
    description: 'When the order is to be reviewed (yyyy-mm-dd)',
  })
  @Matches(/^\d{4}-\d{2}-\d{2}$/, { message: 'Enter the review date (yyyy-mm-dd)' })
  @IsISO8601({ strict: true }, { message: 'Enter the review date (yyyy-mm-dd)' })
  @IsDefined({ message: 'Enter the review date' })
  reviewDate: string;

  @ValidateNested({ each: true })
  @Type(() => OverrideDto)
  // ValidateNested alone walks into a nested list ([[]]) and finds nothing wrong with it.
  @ApiProperty({
    type: () => [OverrideDto],
    maxItems: 20,
    description: 'A reason for each value outside a soft limit; an empty list when there are none',
  })
  @IsObject({ each: true, message: 'Each override is {field, reason}' })
  @ArrayMaxSize(20, { message: 'At most 20 overrides' })
  @IsArray({ message: 'overrides must be a list of {field, reason}' })
  @IsDefined({ message: 'overrides is required (an empty list when there are no soft findings)' })
  overrides: OverrideDto[];

  @ApiProperty({ type: () => SignatureDto, description: 'The prescriber signs with their password' })
  @ValidateNested()
  @Type(() => SignatureDto)
  @IsObject({ message: 'signature must be an object with your password' })
  @IsDefined({ message: 'Sign with your password' })
  signature: SignatureDto;
}
