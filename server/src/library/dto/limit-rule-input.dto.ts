import { Type } from 'class-transformer';
import { IsBoolean, IsDefined, IsIn, IsInt, IsNumber, IsObject, IsOptional, IsPositive, Min, ValidateNested } from 'class-validator';
import { DOSE_UNITS, type DoseUnit, type LimitRuleInput } from '@lockstep/shared';

const finiteNumber = { allowNaN: false, allowInfinity: false };

export class LimitsDto {
  @Min(0, { message: 'hardMin must be 0 or more' })
  @IsNumber(finiteNumber, { message: 'hardMin must be a number' })
  @IsOptional()
  hardMin?: number | null;

  @Min(0, { message: 'softMin must be 0 or more' })
  @IsNumber(finiteNumber, { message: 'softMin must be a number' })
  @IsOptional()
  softMin?: number | null;

  @Min(0, { message: 'softMax must be 0 or more' })
  @IsNumber(finiteNumber, { message: 'softMax must be a number' })
  @IsOptional()
  softMax?: number | null;

  @Min(0, { message: 'hardMax must be 0 or more' })
  @IsNumber(finiteNumber, { message: 'hardMax must be a number' })
  @IsOptional()
  hardMax?: number | null;
}

export class RuleLimitsDto {
  @ValidateNested() @Type(() => LimitsDto) @IsObject() @IsOptional() loadingDose?: LimitsDto;
  @ValidateNested() @Type(() => LimitsDto) @IsObject() @IsOptional() demandDose?: LimitsDto;
  @ValidateNested() @Type(() => LimitsDto) @IsObject() @IsOptional() lockoutMinutes?: LimitsDto;
  @ValidateNested() @Type(() => LimitsDto) @IsObject() @IsOptional() basalRatePerHour?: LimitsDto;
  @ValidateNested() @Type(() => LimitsDto) @IsObject() @IsOptional() oneHourLimit?: LimitsDto;
  @ValidateNested() @Type(() => LimitsDto) @IsObject() @IsOptional() fourHourLimit?: LimitsDto;
  @ValidateNested() @Type(() => LimitsDto) @IsObject() @IsOptional() clinicianBolusDose?: LimitsDto;
}

export class LimitRuleInputDto implements LimitRuleInput {
  @IsPositive({ message: 'drugId must be positive' })
  @IsInt({ message: 'drugId must be a whole number' })
  @IsDefined({ message: 'drugId is required' })
  drugId: number;

  @IsPositive({ message: 'Concentration must be more than 0' })
  @IsNumber(finiteNumber, { message: 'concentrationPerMl must be a number' })
  @IsDefined({ message: 'concentrationPerMl is required' })
  concentrationPerMl: number;

  @IsIn(DOSE_UNITS, { message: 'doseUnit must be mg or mcg' })
  @IsDefined({ message: 'doseUnit is required' })
  doseUnit: DoseUnit;

  @IsBoolean({ message: 'perKg must be true or false' })
  @IsDefined({ message: 'perKg is required' })
  perKg: boolean;

  @ValidateNested()
  @Type(() => RuleLimitsDto)
  @IsObject({ message: 'limits must be an object of parameter limits' })
  @IsDefined({ message: 'limits is required' })
  limits: RuleLimitsDto;
}
