import { Type } from 'class-transformer';
import {
  IsDefined,
  IsNumber,
  IsObject,
  IsOptional,
  IsPositive,
  IsString,
  MaxLength,
  Min,
  MinLength,
  ValidateNested,
} from 'class-validator';
import { MIN_REASON_LENGTH, type BolusRequest, type DiscontinueRequest, type SyringeChangeRequest } from '@lockstep/shared';
import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Trim } from '../../common/validation/trim.decorator.js';
import { ColleagueDto } from './bedside-check.dto.js';

const finite = { allowNaN: false, allowInfinity: false };

class WitnessedDto {
  @ApiProperty({ type: () => ColleagueDto, description: 'A second nurse or charge nurse, signing in on the same screen as witness' })
  @ValidateNested()
  @Type(() => ColleagueDto)
  @IsObject({ message: 'A second nurse signs as witness' })
  @IsDefined({ message: 'A second nurse signs as witness' })
  witness: ColleagueDto;
}

export class BolusDto extends WitnessedDto implements BolusRequest {
  @ApiProperty({
    minimum: 0,
    exclusiveMinimum: true,
    example: 2,
    description: 'The clinician bolus, in the order’s dose unit; at most the ordered clinician bolus',
  })
  @IsPositive({ message: 'The bolus must be more than 0' })
  @IsNumber(finite, { message: 'The bolus must be a number' })
  @IsDefined({ message: 'Enter the bolus amount' })
  amount: number;

  @ApiProperty({
    minLength: MIN_REASON_LENGTH,
    maxLength: 1000,
    description: 'Why the bolus is given',
    example: 'Breakthrough pain on moving',
  })
  @Trim()
  @MaxLength(1000, { message: 'At most 1,000 characters' })
  @MinLength(MIN_REASON_LENGTH, { message: `Give a reason of at least ${MIN_REASON_LENGTH} characters` })
  @IsString({ message: 'Give the reason for the bolus' })
  @IsDefined({ message: 'Give the reason for the bolus (e.g. breakthrough pain)' })
  reason: string;

  @ApiPropertyOptional({
    minLength: MIN_REASON_LENGTH,
    maxLength: 1000,
    description: 'Needed when the amount is outside the ward’s soft limit for a clinician bolus',
    example: 'Agreed with the acute pain team',
  })
  @Trim()
  @MaxLength(1000, { message: 'At most 1,000 characters' })
  @MinLength(MIN_REASON_LENGTH, { message: `Give a reason of at least ${MIN_REASON_LENGTH} characters` })
  @IsString({ message: 'overrideReason must be text' })
  @IsOptional()
  overrideReason?: string;
}

export class SyringeChangeDto extends WitnessedDto implements SyringeChangeRequest {
  /** The pump's volume infused from the old syringe. */
  @ApiProperty({ minimum: 0, example: 42, description: 'The pump’s volume infused from the old syringe, in mL' })
  @Min(0, { message: 'Volume infused cannot be negative' })
  @IsNumber(finite, { message: 'Volume infused must be a number of mL' })
  @IsDefined({ message: 'Enter the volume infused from the old syringe' })
  volumeInfusedMl: number;

  /** What is left in the old syringe, wasted in front of the witness. */
  @ApiProperty({ minimum: 0, example: 8, description: 'What is left in the old syringe, wasted in front of the witness, in mL' })
  @Min(0, { message: 'Waste cannot be negative' })
  @IsNumber(finite, { message: 'Waste must be a number of mL' })
  @IsDefined({ message: 'Enter the volume wasted from the old syringe' })
  wastedMl: number;

  @ApiProperty({ minLength: 1, maxLength: 16, example: 'HK3-7QT', description: 'The release code on the new syringe’s label' })
  @MaxLength(16, { message: 'A release code is 6 characters' })
  @MinLength(1, { message: 'Enter the new syringe’s release code' })
  @IsString({ message: 'Enter the new syringe’s release code' })
  @IsDefined({ message: 'Enter the new syringe’s release code' })
  newReleaseCode: string;
}

export class DiscontinueDto extends WitnessedDto implements DiscontinueRequest {
  @ApiProperty({
    minLength: MIN_REASON_LENGTH,
    maxLength: 1000,
    description: 'The prescriber’s decision to stop, as the nurse records it',
    example: 'Pain controlled on oral analgesia',
  })
  @Trim()
  @MaxLength(1000, { message: 'At most 1,000 characters' })
  @MinLength(MIN_REASON_LENGTH, { message: `Give a reason of at least ${MIN_REASON_LENGTH} characters` })
  @IsString({ message: 'Give the reason (the prescriber’s decision)' })
  @IsDefined({ message: 'Give the reason (the prescriber’s decision)' })
  reason: string;

  @ApiProperty({ minimum: 0, example: 42, description: 'The final volume infused from the pump, in mL' })
  @Min(0, { message: 'Volume infused cannot be negative' })
  @IsNumber(finite, { message: 'Volume infused must be a number of mL' })
  @IsDefined({ message: 'Enter the final volume infused from the pump' })
  volumeInfusedMl: number;

  @ApiProperty({ minimum: 0, example: 8, description: 'The volume wasted in front of the witness, in mL' })
  @Min(0, { message: 'Waste cannot be negative' })
  @IsNumber(finite, { message: 'Waste must be a number of mL' })
  @IsDefined({ message: 'Enter the volume wasted' })
  wastedMl: number;
}
