import { IsEmail, IsInt, IsNumber, Max, Min, ValidateIf } from 'class-validator';

const finite = { allowNaN: false, allowInfinity: false };
// A missing setting stays as it is; a null is validated (and refused) rather than skipped, as
// @IsOptional would, so it can never blank a column that must hold a value.
const unlessAbsent = ValidateIf((_object, value) => value !== undefined);
const emailOrEmpty = ValidateIf((_object, value) => value !== undefined && value !== '');

/** Local monitoring and escalation settings; each change is the ward's own policy. */
export class UpdateWardPolicyDto {
  @Max(240, { message: 'At most 240 minutes' })
  @Min(15, { message: 'At least 15 minutes' })
  @IsInt({ message: 'A whole number of minutes' })
  @unlessAbsent
  observationIntervalFirst24hMinutes?: number;

  @Max(480, { message: 'At most 480 minutes' })
  @Min(15, { message: 'At least 15 minutes' })
  @IsInt({ message: 'A whole number of minutes' })
  @unlessAbsent
  observationIntervalMinutes?: number;

  @Max(20, { message: 'At most 20 per minute' })
  @Min(4, { message: 'At least 4 per minute' })
  @IsInt({ message: 'A whole number per minute' })
  @unlessAbsent
  respiratoryRateThreshold?: number;

  @Max(100, { message: 'At most 100 %' })
  @Min(70, { message: 'At least 70 %' })
  @IsInt({ message: 'A whole number of %' })
  @unlessAbsent
  spo2Threshold?: number;

  @Max(24, { message: 'At most 24 hours' })
  @Min(0.5, { message: 'At least 0.5 hours' })
  @IsNumber(finite, { message: 'A number of hours' })
  @unlessAbsent
  syringeLowThresholdHours?: number;

  @Max(10, { message: 'At most 10 mL' })
  @Min(0, { message: 'Cannot be negative' })
  @IsNumber(finite, { message: 'A number of mL' })
  @unlessAbsent
  reconciliationToleranceMl?: number;

  @Max(10, { message: 'Pain score is 0 to 10' })
  @Min(0, { message: 'Pain score is 0 to 10' })
  @IsInt({ message: 'A whole pain score' })
  @unlessAbsent
  painNotControlledScore?: number;

  @Max(20, { message: 'At most 20' })
  @Min(1, { message: 'At least 1' })
  @IsNumber(finite, { message: 'A number of attempts per delivered dose' })
  @unlessAbsent
  painNotControlledRatio?: number;

  @IsEmail({}, { message: 'Enter an e-mail address (or leave empty)' })
  @emailOrEmpty
  pharmacyEmail?: string;

  @IsEmail({}, { message: 'Enter an e-mail address (or leave empty)' })
  @emailOrEmpty
  nurseInChargeEmail?: string;
}
