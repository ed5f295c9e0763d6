import { Type } from 'class-transformer';
import {
  IsDefined,
  IsIn,
  IsISO8601,
  IsNumber,
  IsObject,
  IsOptional,
  IsPositive,
  IsRFC3339,
  IsString,
  MaxLength,
  MinLength,
  ValidateNested,
} from 'class-validator';
import {
  MIN_REASON_LENGTH,
  NALOXONE_UNITS,
  type NaloxoneRequest,
  type NaloxoneUnit,
  type PauseRequest,
  type ResumeRequest,
} from '@lockstep/shared';
import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { SignatureDto } from '../../common/dto/signature.dto.js';
import { Trim } from '../../common/validation/trim.decorator.js';
import { SecondCheckDto } from './bedside-check.dto.js';
import { PumpSettingsDto } from './pump-settings.dto.js';

const finite = { allowNaN: false, allowInfinity: false };

export class NaloxoneDto implements NaloxoneRequest {
  @ApiProperty({ minimum: 0, exclusiveMinimum: true, example: 100, description: 'The naloxone dose given, in doseUnit' })
  @IsPositive({ message: 'The dose must be more than 0' })
  @IsNumber(finite, { message: 'The dose must be a number' })
  @IsDefined({ message: 'Enter the naloxone dose' })
  dose: number;

  @ApiProperty({ enum: NALOXONE_UNITS, example: 'mcg', description: 'mcg or mg' })
  @IsIn(NALOXONE_UNITS, { message: 'Choose mcg or mg' })
  @IsDefined({ message: 'Choose mcg or mg' })
  doseUnit: NaloxoneUnit;

  @ApiPropertyOptional({
    format: 'date-time',
    example: '2030-01-01T10:00:00Z',
    description: 'When it was given; defaults to now; never in the future, never before the PCA started',
  })
  @IsRFC3339({ message: 'Enter when naloxone was given' })
  @IsISO8601({ strict: true }, { message: 'Enter when naloxone was given' })
  @IsOptional()
  givenAt?: string | null;

  @ApiProperty({ type: () => SignatureDto, description: 'The nurse who gave it signs with their own password' })
  @ValidateNested()
  @Type(() => SignatureDto)
  @IsObject({ message: 'signature must be an object with your password' })
  @IsDefined({ message: 'signature is required: enter your password to sign' })
  signature: SignatureDto;
}

export class PauseDto implements PauseRequest {
  @ApiProperty({
    minLength: MIN_REASON_LENGTH,
    maxLength: 1000,
    example: 'Sedation 3: prescriber called',
    description: 'Why the PCA is paused',
  })
  @Trim()
  @MaxLength(1000, { message: 'At most 1,000 characters' })
  @MinLength(MIN_REASON_LENGTH, { message: `Give a reason of at least ${MIN_REASON_LENGTH} characters` })
  @IsString({ message: 'Give the reason for pausing' })
  @IsDefined({ message: 'Give the reason for pausing' })
  reason: string;
}

export class ResumeDto implements ResumeRequest {
  @ApiProperty({
    minLength: MIN_REASON_LENGTH,
    maxLength: 1000,
    example: 'Rousable, RR 14: prescriber agreed',
    description: 'Why the PCA is resumed',
  })
  @Trim()
  @MaxLength(1000, { message: 'At most 1,000 characters' })
  @MinLength(MIN_REASON_LENGTH, { message: `Give a reason of at least ${MIN_REASON_LENGTH} characters` })
  @IsString({ message: 'Give the reason for resuming' })
  @IsDefined({ message: 'Give the reason for resuming' })
  reason: string;

  @ApiProperty({ type: () => PumpSettingsDto, description: 'What the signed-in nurse reads off the pump' })
  @ValidateNested()
  @Type(() => PumpSettingsDto)
  @IsObject({ message: 'Enter the pump settings' })
  @IsDefined({ message: 'Enter the pump settings' })
  settings: PumpSettingsDto;

  @ApiProperty({ type: () => SecondCheckDto, description: 'A second nurse signs in on the same screen and reads the pump independently' })
  @ValidateNested()
  @Type(() => SecondCheckDto)
  @IsObject({ message: 'A second nurse signs in and reads the pump independently' })
  @IsDefined({ message: 'A second nurse signs in and reads the pump independently' })
  witness: SecondCheckDto;
}
