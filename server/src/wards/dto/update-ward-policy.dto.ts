import { IsEmail, IsInt, IsNumber, IsOptional, Max, Min, ValidateIf } from 'class-validator';

const finite = { allowNaN: false, allowInfinity: false };
const emailOrEmpty = ValidateIf((_object, value) => value !== undefined && value !== '');

/** Local monitoring and escalation settings; each change is the ward's own policy. */
export class UpdateWardPolicyDto {
  @Max(240, { message: 'At most 240 minutes' })
  @Min(15, { message: 'At least 15 minutes' })
  @IsInt({ message: 'A whole number of minutes' })
  @IsOptional()
  observationIntervalFirst24hMinutes?: number;

  @Max(480, { message: 'At most 480 minutes' })
  @Min(15, { message: 'At least 15 minutes' })
  @IsInt({ message: 'A whole number of minutes' })
  @IsOptional()
  observationIntervalMinutes?: number;

  @Max(20, { message: 'At most 20 per minute' })
  @Min(4, { message: 'At least 4 per minute' })
  @IsInt({ message: 'A whole number per minute' })
  @IsOptional()
  respiratoryRateThreshold?: number;

  @Max(100, { message: 'At most 100 %' })
  @Min(70, { message: 'At least 70 %' })
  @IsInt({ message: 'A whole number of %' })
  @IsOptional()
  spo2Threshold?: number;

  @Max(24, { message: 'At most 24 hours' })
  @Min(0.5, { message: 'At least 0.5 hours' })
  @IsNumber(finite, { message: 'A number of hours' })
  @IsOptional()
  syringeLowThresholdHours?: number;

  @Max(10, { message: 'At most 10 mL' })
  @Min(0, { message: 'Cannot be negative' })
  @IsNumber(finite, { message: 'A number of mL' })
  @IsOptional()
  reconciliationToleranceMl?: number;

  @Max(10, { message: 'Pain score is 0 to 10' })
  @Min(0, { message: 'Pain score is 0 to 10' })
  @IsInt({ message: 'A whole pain score' })
  @IsOptional()
  painNotControlledScore?: number;

  @Max(20, { message: 'At most 20' })
  @Min(1, { message: 'At least 1' })
  @IsNumber(finite, { message: 'A number of attempts per delivered dose' })
  @IsOptional()
  painNotControlledRatio?: number;

  @IsEmail({}, { message: 'Enter an e-mail address (or leave empty)' })
  @emailOrEmpty
  @IsOptional()
  pharmacyEmail?: string;

  @IsEmail({}, { message: 'Enter an e-mail address (or leave empty)' })
  @emailOrEmpty
  @IsOptional()
  nurseInChargeEmail?: string;
}
