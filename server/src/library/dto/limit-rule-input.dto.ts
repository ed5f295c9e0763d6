import { Type } from 'class-transformer';
import {
  IsBoolean,
  IsDefined,
  IsIn,
  IsInt,
  IsNumber,
  IsObject,
  IsOptional,
  IsPositive,
  Min,
  ValidateIf,
  ValidateNested,
} from 'class-validator';
import {
  DOSE_UNITS,
  type DoseUnit,
  type LimitRuleInput,
  type LimitsInput,
  POPULATIONS,
  type Population,
  type RuleLimitsInput,
} from '@lockstep/shared';
import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';

const finiteNumber = { allowNaN: false, allowInfinity: false };

export class LimitsDto implements LimitsInput {
  @ApiPropertyOptional({ type: 'number', nullable: true, minimum: 0, description: 'Below this the order is refused' })
  @Min(0, { message: 'hardMin must be 0 or more' })
  @IsNumber(finiteNumber, { message: 'hardMin must be a number' })
  @IsOptional()
  hardMin?: number | null;

  @ApiPropertyOptional({ type: 'number', nullable: true, minimum: 0, description: 'Below this the prescriber gives a reason' })
  @Min(0, { message: 'softMin must be 0 or more' })
  @IsNumber(finiteNumber, { message: 'softMin must be a number' })
  @IsOptional()
  softMin?: number | null;

  @ApiPropertyOptional({ type: 'number', nullable: true, minimum: 0, description: 'Above this the prescriber gives a reason' })
  @Min(0, { message: 'softMax must be 0 or more' })
  @IsNumber(finiteNumber, { message: 'softMax must be a number' })
  @IsOptional()
  softMax?: number | null;

  @ApiPropertyOptional({ type: 'number', nullable: true, minimum: 0, description: 'Above this the order is refused' })
  @Min(0, { message: 'hardMax must be 0 or more' })
  @IsNumber(finiteNumber, { message: 'hardMax must be a number' })
  @IsOptional()
  hardMax?: number | null;

  @ApiPropertyOptional({
    type: 'number',
    nullable: true,
    minimum: 0,
    description: 'Per-kg rules: the most this field may ever be, in the dose unit (not per kg), whatever the weight',
  })
  @Min(0, { message: 'ceiling must be 0 or more' })
  @IsNumber(finiteNumber, { message: 'ceiling must be a number' })
  @IsOptional()
  ceiling?: number | null;
}

const band = (description: string) => ApiPropertyOptional({ type: 'number', nullable: true, minimum: 0, description });

const limits = ApiPropertyOptional({ type: () => LimitsDto });
// A field's limits may be left out (not checked); a null is refused, not stored as a field without limits.
const unlessAbsent = ValidateIf((_object, value) => value !== undefined);

export class RuleLimitsDto implements RuleLimitsInput {
  @limits @ValidateNested() @Type(() => LimitsDto) @IsObject() @unlessAbsent loadingDose?: LimitsDto;
  @limits @ValidateNested() @Type(() => LimitsDto) @IsObject() @unlessAbsent demandDose?: LimitsDto;
  @limits @ValidateNested() @Type(() => LimitsDto) @IsObject() @unlessAbsent lockoutMinutes?: LimitsDto;
  @limits @ValidateNested() @Type(() => LimitsDto) @IsObject() @unlessAbsent basalRatePerHour?: LimitsDto;
  @limits @ValidateNested() @Type(() => LimitsDto) @IsObject() @unlessAbsent oneHourLimit?: LimitsDto;
  @limits @ValidateNested() @Type(() => LimitsDto) @IsObject() @unlessAbsent fourHourLimit?: LimitsDto;
  @limits @ValidateNested() @Type(() => LimitsDto) @IsObject() @unlessAbsent clinicianBolusDose?: LimitsDto;
}

export class LimitRuleInputDto implements LimitRuleInput {
  @ApiProperty({ type: 'integer', minimum: 1, example: 1 })
  @IsPositive({ message: 'drugId must be positive' })
  @IsInt({ message: 'drugId must be a whole number' })
  @IsDefined({ message: 'drugId is required' })
  drugId: number;

  @ApiProperty({ minimum: 0, exclusiveMinimum: true, example: 1 })
  @IsPositive({ message: 'Concentration must be more than 0' })
  @IsNumber(finiteNumber, { message: 'concentrationPerMl must be a number' })
  @IsDefined({ message: 'concentrationPerMl is required' })
  concentrationPerMl: number;

  @ApiProperty({ enum: DOSE_UNITS, example: 'mg' })
  @IsIn(DOSE_UNITS, { message: 'doseUnit must be mg or mcg' })
  @IsDefined({ message: 'doseUnit is required' })
  doseUnit: DoseUnit;

  @ApiProperty({ type: 'boolean', example: false, description: 'Dose limits are per kg of body weight' })
  @IsBoolean({ message: 'perKg must be true or false' })
  @IsDefined({ message: 'perKg is required' })
  perKg: boolean;

  @ApiPropertyOptional({ enum: POPULATIONS, example: 'adult', description: 'Who the rule is for; left out, adult' })
  @IsIn(POPULATIONS, { message: 'population must be adult or paediatric' })
  @unlessAbsent
  population?: Population;

  @band('Paediatric rules: the youngest age the rule is for, in years (inclusive); blank for no bound')
  @Min(0, { message: 'minAgeYears must be 0 or more' })
  @IsNumber(finiteNumber, { message: 'minAgeYears must be a number' })
  @IsOptional()
  minAgeYears?: number | null;

  @band('Paediatric rules: the rule is for ages under this, in years; blank for no bound')
  @Min(0, { message: 'maxAgeYears must be 0 or more' })
  @IsNumber(finiteNumber, { message: 'maxAgeYears must be a number' })
  @IsOptional()
  maxAgeYears?: number | null;

  @band('Paediatric rules: the lightest weight the rule is for, in kg (inclusive); blank for no bound')
  @Min(0, { message: 'minWeightKg must be 0 or more' })
  @IsNumber(finiteNumber, { message: 'minWeightKg must be a number' })
  @IsOptional()
  minWeightKg?: number | null;

  @band('Paediatric rules: the rule is for weights under this, in kg; blank for no bound')
  @Min(0, { message: 'maxWeightKg must be 0 or more' })
  @IsNumber(finiteNumber, { message: 'maxWeightKg must be a number' })
  @IsOptional()
  maxWeightKg?: number | null;

  @ApiProperty({ type: () => RuleLimitsDto, description: 'Limits per order field; a field left out is not checked' })
  @ValidateNested()
  @Type(() => RuleLimitsDto)
  @IsObject({ message: 'limits must be an object of parameter limits' })
  @IsDefined({ message: 'limits is required' })
  limits: RuleLimitsDto;
}
