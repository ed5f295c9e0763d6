import { Type } from 'class-transformer';
import { IsDefined, IsNumber, IsObject, IsOptional, IsPositive, IsString, MaxLength, Min, MinLength, ValidateNested } from 'class-validator';
import { MIN_REASON_LENGTH } from '@lockstep/shared';
import { Trim } from '../../common/validation/trim.decorator.js';
import { ColleagueDto } from './bedside-check.dto.js';

const finite = { allowNaN: false, allowInfinity: false };

class WitnessedDto {
  @ValidateNested()
  @Type(() => ColleagueDto)
  @IsObject({ message: 'A second nurse signs as witness' })
  @IsDefined({ message: 'A second nurse signs as witness' })
  witness: ColleagueDto;
}

export class BolusDto extends WitnessedDto {
  @IsPositive({ message: 'The bolus must be more than 0' })
  @IsNumber(finite, { message: 'The bolus must be a number' })
  @IsDefined({ message: 'Enter the bolus amount' })
  amount: number;

  @Trim()
  @MaxLength(1000, { message: 'At most 1,000 characters' })
  @MinLength(MIN_REASON_LENGTH, { message: `Give a reason of at least ${MIN_REASON_LENGTH} characters` })
  @IsString({ message: 'Give the reason for the bolus' })
  @IsDefined({ message: 'Give the reason for the bolus (e.g. breakthrough pain)' })
  reason: string;

  @Trim()
  @MaxLength(1000, { message: 'At most 1,000 characters' })
  @MinLength(MIN_REASON_LENGTH, { message: `Give a reason of at least ${MIN_REASON_LENGTH} characters` })
  @IsString({ message: 'overrideReason must be text' })
  @IsOptional()
  overrideReason?: string;
}

export class SyringeChangeDto extends WitnessedDto {
  /** The pump's volume infused from the old syringe. */
  @Min(0, { message: 'Volume infused cannot be negative' })
  @IsNumber(finite, { message: 'Volume infused must be a number of mL' })
  @IsDefined({ message: 'Enter the volume infused from the old syringe' })
  volumeInfusedMl: number;

  /** What is left in the old syringe, wasted in front of the witness. */
  @Min(0, { message: 'Waste cannot be negative' })
  @IsNumber(finite, { message: 'Waste must be a number of mL' })
  @IsDefined({ message: 'Enter the volume wasted from the old syringe' })
  wastedMl: number;

  @MaxLength(16, { message: 'A release code is 6 characters' })
  @MinLength(1, { message: 'Enter the new syringe’s release code' })
  @IsString({ message: 'Enter the new syringe’s release code' })
  @IsDefined({ message: 'Enter the new syringe’s release code' })
  newReleaseCode: string;
}

export class DiscontinueDto extends WitnessedDto {
  @Trim()
  @MaxLength(1000, { message: 'At most 1,000 characters' })
  @MinLength(MIN_REASON_LENGTH, { message: `Give a reason of at least ${MIN_REASON_LENGTH} characters` })
  @IsString({ message: 'Give the reason (the prescriber’s decision)' })
  @IsDefined({ message: 'Give the reason (the prescriber’s decision)' })
  reason: string;

  @Min(0, { message: 'Volume infused cannot be negative' })
  @IsNumber(finite, { message: 'Volume infused must be a number of mL' })
  @IsDefined({ message: 'Enter the final volume infused from the pump' })
  volumeInfusedMl: number;

  @Min(0, { message: 'Waste cannot be negative' })
  @IsNumber(finite, { message: 'Waste must be a number of mL' })
  @IsDefined({ message: 'Enter the volume wasted' })
  wastedMl: number;
}
