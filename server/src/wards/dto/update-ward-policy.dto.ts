import { IS_EMAIL, isEmail, IsInt, IsNumber, Max, Min, ValidateBy, ValidateIf } from 'class-validator';
import { type UpdateWardPolicyRequest, WARD_POLICY_FLOORS as FLOORS } from '@lockstep/shared';
import { ApiPropertyOptional } from '@nestjs/swagger';

const finite = { allowNaN: false, allowInfinity: false };
// A missing setting stays as it is; a null is validated (and refused) rather than skipped, as
// @IsOptional would, so it can never blank a column that must hold a value.
const unlessAbsent = ValidateIf((_object, value) => value !== undefined);
const emailOrEmpty = ValidateIf((_object, value) => value !== undefined && value !== '');
/** @IsEmail(), except that text holding a lone surrogate, on which validator.js throws (a 500), is refused. */
const IsEmailAddress = () =>
  ValidateBy(
    { name: IS_EMAIL, validator: { validate: (value) => typeof value === 'string' && !/\p{Surrogate}/u.test(value) && isEmail(value) } },
    { message: 'Enter an e-mail address (or leave empty)' },
  );

/** Local monitoring and escalation settings; each change is the ward's own policy. */
export class UpdateWardPolicyDto implements UpdateWardPolicyRequest {
  @ApiPropertyOptional({
    type: 'integer',
    minimum: 15,
    maximum: FLOORS.observationIntervalFirst24hMinutes.max,
    example: 60,
    description: 'Minutes between observations in the first 24 hours of a PCA; a ward can shorten it, not lengthen it past the floor',
  })
  @Max(FLOORS.observationIntervalFirst24hMinutes.max, { message: FLOORS.observationIntervalFirst24hMinutes.message })
  @Min(15, { message: 'At least 15 minutes' })
  @IsInt({ message: 'A whole number of minutes' })
  @unlessAbsent
  observationIntervalFirst24hMinutes?: number;

  @ApiPropertyOptional({
    type: 'integer',
    minimum: 15,
    maximum: FLOORS.observationIntervalMinutes.max,
    example: 120,
    description: 'Minutes between observations after the first 24 hours; a ward can shorten it, not lengthen it past the floor',
  })
  @Max(FLOORS.observationIntervalMinutes.max, { message: FLOORS.observationIntervalMinutes.message })
  @Min(15, { message: 'At least 15 minutes' })
  @IsInt({ message: 'A whole number of minutes' })
  @unlessAbsent
  observationIntervalMinutes?: number;

  @ApiPropertyOptional({
    type: 'integer',
    minimum: 5,
    maximum: FLOORS.closeObservationIntervalMinutes.max,
    example: 15,
    description:
      'Minutes between observations while close observation runs (after a start, loading dose, clinician bolus, regimen or syringe change, urgent flag or naloxone); a ward can shorten it, not lengthen it past the floor',
  })
  @Max(FLOORS.closeObservationIntervalMinutes.max, { message: FLOORS.closeObservationIntervalMinutes.message })
  @Min(5, { message: 'At least 5 minutes' })
  @IsInt({ message: 'A whole number of minutes' })
  @unlessAbsent
  closeObservationIntervalMinutes?: number;

  @ApiPropertyOptional({
    type: 'integer',
    minimum: FLOORS.closeObservationPeriodMinutes.min,
    maximum: 240,
    example: 60,
    description:
      'Minutes close observation lasts after a start, loading dose, clinician bolus, regimen or syringe change; a ward can lengthen it, not shorten it past the floor',
  })
  @Max(240, { message: 'At most 240 minutes' })
  @Min(FLOORS.closeObservationPeriodMinutes.min, { message: FLOORS.closeObservationPeriodMinutes.message })
  @IsInt({ message: 'A whole number of minutes' })
  @unlessAbsent
  closeObservationPeriodMinutes?: number;

  @ApiPropertyOptional({
    type: 'integer',
    minimum: FLOORS.naloxoneClosePeriodMinutes.min,
    maximum: 720,
    example: 120,
    description: 'Minutes close observation lasts after naloxone; a ward can lengthen it, not shorten it past the floor',
  })
  @Max(720, { message: 'At most 720 minutes' })
  @Min(FLOORS.naloxoneClosePeriodMinutes.min, { message: FLOORS.naloxoneClosePeriodMinutes.message })
  @IsInt({ message: 'A whole number of minutes' })
  @unlessAbsent
  naloxoneClosePeriodMinutes?: number;

  @ApiPropertyOptional({
    type: 'integer',
    minimum: FLOORS.respiratoryRateThreshold.min,
    maximum: 20,
    example: 9,
    description: 'A respiratory rate below this raises an urgent flag; never below the floor (8/min or below is always urgent)',
  })
  @Max(20, { message: 'At most 20 per minute' })
  @Min(FLOORS.respiratoryRateThreshold.min, { message: FLOORS.respiratoryRateThreshold.message })
  @IsInt({ message: 'A whole number per minute' })
  @unlessAbsent
  respiratoryRateThreshold?: number;

  @ApiPropertyOptional({
    type: 'integer',
    minimum: FLOORS.spo2Threshold.min,
    maximum: 100,
    example: 92,
    description: 'An SpO2 below this raises an urgent flag; never below the floor (91 % or below is always urgent)',
  })
  @Max(100, { message: 'At most 100 %' })
  @Min(FLOORS.spo2Threshold.min, { message: FLOORS.spo2Threshold.message })
  @IsInt({ message: 'A whole number of %' })
  @unlessAbsent
  spo2Threshold?: number;

  @ApiPropertyOptional({
    type: 'number',
    minimum: 0.5,
    maximum: 24,
    example: 2,
    description: 'A syringe projected to run out within this many hours raises a review flag',
  })
  @Max(24, { message: 'At most 24 hours' })
  @Min(0.5, { message: 'At least 0.5 hours' })
  @IsNumber(finite, { message: 'A number of hours' })
  @unlessAbsent
  syringeLowThresholdHours?: number;

  @ApiPropertyOptional({
    type: 'number',
    minimum: 0,
    maximum: 10,
    example: 0.5,
    description: 'A reconciliation difference above this many mL is reported',
  })
  @Max(10, { message: 'At most 10 mL' })
  @Min(0, { message: 'Cannot be negative' })
  @IsNumber(finite, { message: 'A number of mL' })
  @unlessAbsent
  reconciliationToleranceMl?: number;

  @ApiPropertyOptional({
    type: 'integer',
    minimum: 0,
    maximum: 10,
    example: 7,
    description: 'A pain score at or above this, with attempts per delivered dose at or above painNotControlledRatio, raises a review flag',
  })
  @Max(10, { message: 'Pain score is 0 to 10' })
  @Min(0, { message: 'Pain score is 0 to 10' })
  @IsInt({ message: 'A whole pain score' })
  @unlessAbsent
  painNotControlledScore?: number;

  @ApiPropertyOptional({
    type: 'number',
    minimum: 1,
    maximum: 20,
    example: 2,
    description: 'Attempts per delivered dose at or above this, with a pain score at or above painNotControlledScore, raises a review flag',
  })
  @Max(20, { message: 'At most 20' })
  @Min(1, { message: 'At least 1' })
  @IsNumber(finite, { message: 'A number of attempts per delivered dose' })
  @unlessAbsent
  painNotControlledRatio?: number;

  @ApiPropertyOptional({
    type: 'integer',
    minimum: 1,
    maximum: 365,
    example: 7,
    description: "A patient's weight measured more than this many days ago is a caution on a weight-based or child's order",
  })
  @Max(365, { message: 'At most 365 days' })
  @Min(1, { message: 'At least 1 day' })
  @IsInt({ message: 'A whole number of days' })
  @unlessAbsent
  weightMaxAgeDays?: number;

  @ApiPropertyOptional({
    format: 'email',
    example: 'pharmacy@hospital.example',
    description: 'Where Lockstep e-mails the ward’s pharmacy; empty for none',
  })
  @IsEmailAddress()
  @emailOrEmpty
  pharmacyEmail?: string;

  @ApiPropertyOptional({
    format: 'email',
    example: 'harbour.nic@hospital.example',
    description: 'Where Lockstep e-mails the nurse in charge (urgent flags among others); empty for none',
  })
  @IsEmailAddress()
  @emailOrEmpty
  nurseInChargeEmail?: string;
}
