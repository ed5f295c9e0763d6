import { IsDefined, IsIn, IsInt, IsNumber, IsOptional, IsPositive, IsString, MaxLength, Min } from 'class-validator';
import { DOSE_UNITS, type DoseUnit, type OrderFields } from '@lockstep/shared';
import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';

const finite = { allowNaN: false, allowInfinity: false };

// The decorator nearest the property runs first (see auth/dto/login.dto.ts).
export class OrderFieldsDto implements OrderFields {
  @ApiProperty({ type: 'integer', minimum: 1, example: 1 })
  @IsPositive({ message: 'patientId must be positive' })
  @IsInt({ message: 'patientId must be a whole number' })
  @IsDefined({ message: 'Choose the patient' })
  patientId: number;

  @ApiProperty({ type: 'integer', minimum: 1, example: 1 })
  @IsPositive({ message: 'drugId must be positive' })
  @IsInt({ message: 'drugId must be a whole number' })
  @IsDefined({ message: 'Choose the drug' })
  drugId: number;

  @ApiProperty({ minimum: 0, exclusiveMinimum: true, example: 1, description: 'Dose unit per mL' })
  @IsPositive({ message: 'Concentration must be more than 0' })
  @IsNumber(finite, { message: 'Concentration must be a number' })
  @IsDefined({ message: 'Enter the concentration' })
  concentrationPerMl: number;

  @ApiProperty({ enum: DOSE_UNITS, example: 'mg', description: 'The unit of every dose in the order' })
  @IsIn(DOSE_UNITS, { message: 'Dose unit must be mg or mcg' })
  @IsDefined({ message: 'Choose the dose unit' })
  doseUnit: DoseUnit;

  @ApiPropertyOptional({
    type: 'number',
    nullable: true,
    minimum: 0,
    example: null,
    description: 'Given once before the PCA starts; null or absent for none',
  })
  @Min(0, { message: 'Loading dose cannot be negative' })
  @IsNumber(finite, { message: 'Loading dose must be a number' })
  @IsOptional()
  loadingDose?: number | null;

  @ApiProperty({ minimum: 0, example: 1, description: 'Given each time the patient presses the button' })
  @Min(0, { message: 'Demand dose cannot be negative' })
  @IsNumber(finite, { message: 'Demand dose must be a number' })
  @IsDefined({ message: 'Enter the demand dose' })
  demandDose: number;

  @ApiProperty({ minimum: 1, example: 10, description: 'Minutes after a demand dose during which the pump gives no other' })
  @Min(1, { message: 'Lockout must be at least 1 minute' })
  @IsNumber(finite, { message: 'Lockout must be a number of minutes' })
  @IsDefined({ message: 'Enter the lockout in minutes' })
  lockoutMinutes: number;

  @ApiProperty({ minimum: 0, example: 0, description: 'Continuous rate per hour; 0 for none' })
  @Min(0, { message: 'Basal rate cannot be negative (enter 0 for none)' })
  @IsNumber(finite, { message: 'Basal rate must be a number' })
  @IsDefined({ message: 'Enter the basal rate (0 for none)' })
  basalRatePerHour: number;

  @ApiPropertyOptional({
    type: 'number',
    nullable: true,
    minimum: 0,
    example: null,
    description: 'Most in any hour, demand doses and basal together',
  })
  @Min(0, { message: '1-hour limit cannot be negative' })
  @IsNumber(finite, { message: '1-hour limit must be a number' })
  @IsOptional()
  oneHourLimit?: number | null;

  @ApiPropertyOptional({
    type: 'number',
    nullable: true,
    minimum: 0,
    example: 30,
    description: 'Most in any 4 hours, demand doses and basal together',
  })
  @Min(0, { message: '4-hour limit cannot be negative' })
  @IsNumber(finite, { message: '4-hour limit must be a number' })
  @IsOptional()
  fourHourLimit?: number | null;

  @ApiPropertyOptional({
    type: 'number',
    nullable: true,
    minimum: 0,
    example: 2,
    description: 'What a nurse may give for breakthrough pain, with a second nurse',
  })
  @Min(0, { message: 'Clinician bolus cannot be negative' })
  @IsNumber(finite, { message: 'Clinician bolus must be a number' })
  @IsOptional()
  clinicianBolusDose?: number | null;

  @ApiPropertyOptional({ maxLength: 500, example: 'Pain after laparotomy' })
  @MaxLength(500, { message: 'Indication is at most 500 characters' })
  @IsString({ message: 'Indication must be text' })
  @IsOptional()
  indication?: string;
}
