import { IsDefined, IsIn, IsInt, IsNumber, IsOptional, IsPositive, IsString, MaxLength, Min } from 'class-validator';
import { DOSE_UNITS, type DoseUnit, type OrderFields } from '@lockstep/shared';

const finite = { allowNaN: false, allowInfinity: false };

// The decorator nearest the property runs first (see auth/dto/login.dto.ts).
export class OrderFieldsDto implements OrderFields {
  @IsPositive({ message: 'patientId must be positive' })
  @IsInt({ message: 'patientId must be a whole number' })
  @IsDefined({ message: 'Choose the patient' })
  patientId: number;

  @IsPositive({ message: 'drugId must be positive' })
  @IsInt({ message: 'drugId must be a whole number' })
  @IsDefined({ message: 'Choose the drug' })
  drugId: number;

  @IsPositive({ message: 'Concentration must be more than 0' })
  @IsNumber(finite, { message: 'Concentration must be a number' })
  @IsDefined({ message: 'Enter the concentration' })
  concentrationPerMl: number;

  @IsIn(DOSE_UNITS, { message: 'Dose unit must be mg or mcg' })
  @IsDefined({ message: 'Choose the dose unit' })
  doseUnit: DoseUnit;

  @Min(0, { message: 'Loading dose cannot be negative' })
  @IsNumber(finite, { message: 'Loading dose must be a number' })
  @IsOptional()
  loadingDose?: number | null;

  @Min(0, { message: 'Demand dose cannot be negative' })
  @IsNumber(finite, { message: 'Demand dose must be a number' })
  @IsDefined({ message: 'Enter the demand dose' })
  demandDose: number;

  @Min(1, { message: 'Lockout must be at least 1 minute' })
  @IsNumber(finite, { message: 'Lockout must be a number of minutes' })
  @IsDefined({ message: 'Enter the lockout in minutes' })
  lockoutMinutes: number;

  @Min(0, { message: 'Basal rate cannot be negative (enter 0 for none)' })
  @IsNumber(finite, { message: 'Basal rate must be a number' })
  @IsDefined({ message: 'Enter the basal rate (0 for none)' })
  basalRatePerHour: number;

  @Min(0, { message: '1-hour limit cannot be negative' })
  @IsNumber(finite, { message: '1-hour limit must be a number' })
  @IsOptional()
  oneHourLimit?: number | null;

  @Min(0, { message: '4-hour limit cannot be negative' })
  @IsNumber(finite, { message: '4-hour limit must be a number' })
  @IsOptional()
  fourHourLimit?: number | null;

  @Min(0, { message: 'Clinician bolus cannot be negative' })
  @IsNumber(finite, { message: 'Clinician bolus must be a number' })
  @IsOptional()
  clinicianBolusDose?: number | null;

  @MaxLength(500, { message: 'Indication is at most 500 characters' })
  @IsString({ message: 'Indication must be text' })
  @IsOptional()
  indication?: string;
}
