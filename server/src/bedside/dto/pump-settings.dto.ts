import { IsDefined, IsInt, IsNumber, IsPositive, Min, ValidateIf } from 'class-validator';
import type { PumpSettings } from '@lockstep/shared';
import { ApiProperty } from '@nestjs/swagger';

const finite = { allowNaN: false, allowInfinity: false };
const unlessNull = ValidateIf((_object, value) => value !== null);

/** What a nurse reads off the pump. Optional values are sent as null when the pump has none set. */
export class PumpSettingsDto implements PumpSettings {
  @ApiProperty({ type: 'integer', minimum: 1, example: 1, description: 'The drug the pump is set up for' })
  @IsPositive({ message: 'Choose the drug' })
  @IsInt({ message: 'Choose the drug' })
  @IsDefined({ message: 'Choose the drug' })
  drugId: number;

  @ApiProperty({ minimum: 0, exclusiveMinimum: true, example: 1, description: 'Concentration on the pump, in the dose unit per mL' })
  @IsPositive({ message: 'Concentration must be more than 0' })
  @IsNumber(finite, { message: 'Concentration must be a number' })
  @IsDefined({ message: 'Enter the concentration' })
  concentrationPerMl: number;

  @ApiProperty({ minimum: 0, exclusiveMinimum: true, example: 50, description: 'Syringe volume in mL' })
  @IsPositive({ message: 'Syringe volume must be more than 0' })
  @IsNumber(finite, { message: 'Syringe volume must be a number of mL' })
  @IsDefined({ message: 'Enter the syringe volume' })
  syringeVolumeMl: number;

  @ApiProperty({ type: 'number', nullable: true, minimum: 0, example: null, description: 'Loading dose; null when the pump has none' })
  @Min(0, { message: 'Loading dose cannot be negative' })
  @IsNumber(finite, { message: 'Loading dose must be a number, or empty for none' })
  @unlessNull
  @IsDefined({ message: 'Enter the loading dose, or leave it empty (null) for none' })
  loadingDose: number | null;

  @ApiProperty({ minimum: 0, example: 1, description: 'Demand dose, in the dose unit' })
  @Min(0, { message: 'Demand dose cannot be negative' })
  @IsNumber(finite, { message: 'Demand dose must be a number' })
  @IsDefined({ message: 'Enter the demand dose' })
  demandDose: number;

  @ApiProperty({ minimum: 0, example: 10, description: 'Lockout interval in minutes' })
  @Min(0, { message: 'Lockout cannot be negative' })
  @IsNumber(finite, { message: 'Lockout must be a number of minutes' })
  @IsDefined({ message: 'Enter the lockout' })
  lockoutMinutes: number;

  @ApiProperty({ minimum: 0, example: 0, description: 'Basal rate per hour; 0 for none' })
  @Min(0, { message: 'Basal rate cannot be negative' })
  @IsNumber(finite, { message: 'Basal rate must be a number (0 for none)' })
  @IsDefined({ message: 'Enter the basal rate (0 for none)' })
  basalRatePerHour: number;

  @ApiProperty({ type: 'number', nullable: true, minimum: 0, example: null, description: '1-hour limit; null for none' })
  @Min(0, { message: '1-hour limit cannot be negative' })
  @IsNumber(finite, { message: '1-hour limit must be a number, or empty for none' })
  @unlessNull
  @IsDefined({ message: 'Enter the 1-hour limit, or leave it empty (null) for none' })
  oneHourLimit: number | null;

  @ApiProperty({ type: 'number', nullable: true, minimum: 0, example: 30, description: '4-hour limit; null for none' })
  @Min(0, { message: '4-hour limit cannot be negative' })
  @IsNumber(finite, { message: '4-hour limit must be a number, or empty for none' })
  @unlessNull
  @IsDefined({ message: 'Enter the 4-hour limit, or leave it empty (null) for none' })
  fourHourLimit: number | null;
}
