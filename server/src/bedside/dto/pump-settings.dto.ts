import { IsDefined, IsInt, IsNumber, IsPositive, Min, ValidateIf } from 'class-validator';
import type { PumpSettings } from '@lockstep/shared';

const finite = { allowNaN: false, allowInfinity: false };
const unlessNull = ValidateIf((_object, value) => value !== null);

/** What a nurse reads off the pump. Optional values are sent as null when the pump has none set. */
export class PumpSettingsDto implements PumpSettings {
  @IsPositive({ message: 'Choose the drug' })
  @IsInt({ message: 'Choose the drug' })
  @IsDefined({ message: 'Choose the drug' })
  drugId: number;

  @IsPositive({ message: 'Concentration must be more than 0' })
  @IsNumber(finite, { message: 'Concentration must be a number' })
  @IsDefined({ message: 'Enter the concentration' })
  concentrationPerMl: number;

  @IsPositive({ message: 'Syringe volume must be more than 0' })
  @IsNumber(finite, { message: 'Syringe volume must be a number of mL' })
  @IsDefined({ message: 'Enter the syringe volume' })
  syringeVolumeMl: number;

  @Min(0, { message: 'Loading dose cannot be negative' })
  @IsNumber(finite, { message: 'Loading dose must be a number, or empty for none' })
  @unlessNull
  @IsDefined({ message: 'Enter the loading dose, or leave it empty (null) for none' })
  loadingDose: number | null;

  @Min(0, { message: 'Demand dose cannot be negative' })
  @IsNumber(finite, { message: 'Demand dose must be a number' })
  @IsDefined({ message: 'Enter the demand dose' })
  demandDose: number;

  @Min(0, { message: 'Lockout cannot be negative' })
  @IsNumber(finite, { message: 'Lockout must be a number of minutes' })
  @IsDefined({ message: 'Enter the lockout' })
  lockoutMinutes: number;

  @Min(0, { message: 'Basal rate cannot be negative' })
  @IsNumber(finite, { message: 'Basal rate must be a number (0 for none)' })
  @IsDefined({ message: 'Enter the basal rate (0 for none)' })
  basalRatePerHour: number;

  @Min(0, { message: '1-hour limit cannot be negative' })
  @IsNumber(finite, { message: '1-hour limit must be a number, or empty for none' })
  @unlessNull
  @IsDefined({ message: 'Enter the 1-hour limit, or leave it empty (null) for none' })
  oneHourLimit: number | null;

  @Min(0, { message: '4-hour limit cannot be negative' })
  @IsNumber(finite, { message: '4-hour limit must be a number, or empty for none' })
  @unlessNull
  @IsDefined({ message: 'Enter the 4-hour limit, or leave it empty (null) for none' })
  fourHourLimit: number | null;
}
