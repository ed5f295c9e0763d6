import {
  IsBoolean,
  IsDefined,
  IsIn,
  IsInt,
  IsISO8601,
  IsNumber,
  IsOptional,
  IsPositive,
  IsString,
  Matches,
  Max,
  MaxLength,
  Min,
  MinLength,
  ValidateIf,
} from 'class-validator';
import {
  ALLERGY_SEVERITIES,
  SPO2_SCALES,
  type Spo2Scale,
  type Spo2ScaleRequest,
  TOLERANCE_MAX_DAYS,
  TOLERANCE_MAX_ORAL_MORPHINE_MG_PER_DAY,
  WEIGHT_MAX_KG,
  type AddAllergyRequest,
  type AllergySeverity,
  type OpioidToleranceRequest,
  type RecordWeightRequest,
} from '@lockstep/shared';
import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Trim } from '../../common/validation/trim.decorator.js';

const finite = { allowNaN: false, allowInfinity: false };
const unlessNull = ValidateIf((_object, value) => value !== null);

/** One allergy entry. With a formulary drug the substance is the drug's generic name, whatever is sent. */
export class AddAllergyDto implements AddAllergyRequest {
  @ApiPropertyOptional({
    type: 'integer',
    nullable: true,
    minimum: 1,
    example: 1,
    description: 'The formulary drug; null or absent for free text',
  })
  @IsPositive({ message: 'drugId must be positive' })
  @IsInt({ message: 'drugId must be a whole number' })
  @IsOptional()
  drugId?: number | null;

  @ApiProperty({ minLength: 1, maxLength: 120, example: 'Morphine' })
  @Trim()
  @MaxLength(120, { message: 'Substance is at most 120 characters' })
  @MinLength(1, { message: 'Enter the substance' })
  @IsString({ message: 'Substance must be text' })
  @IsDefined({ message: 'Enter the substance' })
  substance: string;

  @ApiProperty({ minLength: 1, maxLength: 200, example: 'Itch' })
  @Trim()
  @MaxLength(200, { message: 'Reaction is at most 200 characters' })
  @MinLength(1, { message: 'Enter the reaction (or "not known")' })
  @IsString({ message: 'Reaction must be text' })
  @IsDefined({ message: 'Enter the reaction (or "not known")' })
  reaction: string;

  @ApiProperty({
    enum: ALLERGY_SEVERITIES,
    example: 'allergy',
    description: 'Anaphylaxis blocks ordering the drug; the others need a reason',
  })
  @IsIn(ALLERGY_SEVERITIES, { message: 'Severity must be intolerance, allergy or anaphylaxis' })
  @IsDefined({ message: 'Choose the severity' })
  severity: AllergySeverity;
}

/** Opioid tolerance and its basis (FDA definition: at least 60 mg oral morphine a day for a week or longer). */
export class OpioidToleranceDto implements OpioidToleranceRequest {
  @ApiProperty({ example: true, description: 'Must agree with the basis: tolerant only with a basis that meets the definition' })
  @IsBoolean({ message: 'opioidTolerant must be true or false' })
  @IsDefined({ message: 'Say whether the patient is opioid tolerant' })
  opioidTolerant: boolean;

  @ApiProperty({
    type: 'number',
    nullable: true,
    minimum: 0,
    exclusiveMinimum: true,
    maximum: TOLERANCE_MAX_ORAL_MORPHINE_MG_PER_DAY,
    example: 90,
    description: 'Oral morphine (or equianalgesic) mg a day; null for none',
  })
  @Max(TOLERANCE_MAX_ORAL_MORPHINE_MG_PER_DAY, { message: `Oral morphine a day is at most ${TOLERANCE_MAX_ORAL_MORPHINE_MG_PER_DAY} mg` })
  @IsPositive({ message: 'Oral morphine a day must be more than 0 mg' })
  @IsNumber(finite, { message: 'Oral morphine a day must be a number of mg' })
  @unlessNull
  @IsDefined({ message: 'Enter the oral morphine mg a day, or leave it empty (null) for none' })
  oralMorphineMgPerDay: number | null;

  @ApiProperty({
    type: 'integer',
    nullable: true,
    minimum: 1,
    maximum: TOLERANCE_MAX_DAYS,
    example: 30,
    description: 'For how many days; null for none',
  })
  @Max(TOLERANCE_MAX_DAYS, { message: `At most ${TOLERANCE_MAX_DAYS} days` })
  @Min(1, { message: 'At least 1 day' })
  @IsInt({ message: 'Days must be a whole number' })
  @unlessNull
  @IsDefined({ message: 'Enter the number of days, or leave it empty (null) for none' })
  days: number | null;
}

/** A new weight and the day it was measured (not in the future, not before birth). */
export class RecordWeightDto implements RecordWeightRequest {
  @ApiProperty({ minimum: 0, exclusiveMinimum: true, maximum: WEIGHT_MAX_KG, example: 72.5 })
  @Max(WEIGHT_MAX_KG, { message: `Weight is at most ${WEIGHT_MAX_KG} kg` })
  @IsPositive({ message: 'Weight must be more than 0 kg' })
  @IsNumber(finite, { message: 'Weight must be a number of kg' })
  @IsDefined({ message: 'Enter the weight in kg' })
  weightKg: number;

  @ApiProperty({
    format: 'date',
    pattern: '^\\d{4}-\\d{2}-\\d{2}$',
    example: '2026-12-01',
    description: 'The day it was measured (yyyy-mm-dd)',
  })
  @Matches(/^\d{4}-\d{2}-\d{2}$/, { message: 'Enter the date the weight was measured (yyyy-mm-dd)' })
  @IsISO8601({ strict: true }, { message: 'Enter the date the weight was measured (yyyy-mm-dd)' })
  @IsDefined({ message: 'Enter the date the weight was measured' })
  measuredOn: string;
}

/** The patient's NEWS2 SpO2 scale: 2 only for confirmed hypercapnic respiratory failure (RCP, NEWS2, 2017). */
export class Spo2ScaleDto implements Spo2ScaleRequest {
  @ApiProperty({ enum: SPO2_SCALES, example: '1', description: 'NEWS2 SpO2 scale: 2 only for confirmed hypercapnic respiratory failure' })
  @IsIn(SPO2_SCALES, { message: 'SpO2 scale is 1 or 2' })
  @IsDefined({ message: 'Choose SpO2 scale 1 or 2' })
  spo2Scale: Spo2Scale;
}
