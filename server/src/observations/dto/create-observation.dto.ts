import { IsDefined, IsIn, IsInt, IsISO8601, IsNumber, IsOptional, IsRFC3339, IsString, Max, MaxLength, Min } from 'class-validator';
import {
  CONSCIOUSNESS_LEVELS,
  type Consciousness,
  type CreateObservationRequest,
  OXYGEN_DEVICES,
  OXYGEN_REQUIRED_MESSAGE,
  type OxygenDevice,
  SEDATION_LEVELS,
  type SedationLevel,
} from '@lockstep/shared';
import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';

const finite = { allowNaN: false, allowInfinity: false };

export class CreateObservationDto implements CreateObservationRequest {
  /** Defaults to now; never in the future, never before the PCA started. */
  // ISO 8601 alone lets through week dates (2030-W01-1) and compact forms that Date cannot read.
  @ApiPropertyOptional({
    format: 'date-time',
    example: '2030-01-01T10:00:00Z',
    description: 'When observed; defaults to now; never in the future, never before the PCA started',
  })
  @IsRFC3339({ message: 'Enter the time of the observation' })
  @IsISO8601({ strict: true }, { message: 'Enter the time of the observation' })
  @IsOptional()
  at?: string;

  @ApiProperty({ type: 'integer', minimum: 0, maximum: 10, example: 3, description: 'Pain score, 0 to 10' })
  @Max(10, { message: 'Pain score is 0 to 10' })
  @Min(0, { message: 'Pain score is 0 to 10' })
  @IsInt({ message: 'Pain score is a whole number from 0 to 10' })
  @IsDefined({ message: 'Enter the pain score' })
  painScore: number;

  @ApiProperty({ enum: SEDATION_LEVELS, example: '1', description: 'Pasero Opioid-induced Sedation Scale: S, 1, 2, 3 or 4' })
  @IsIn(SEDATION_LEVELS, { message: 'Sedation level is S, 1, 2, 3 or 4' })
  @IsDefined({ message: 'Enter the sedation level' })
  sedationLevel: SedationLevel;

  @ApiProperty({ type: 'integer', minimum: 0, maximum: 80, example: 14, description: 'Breaths per minute' })
  @Max(80, { message: 'Respiratory rate is 0 to 80 per minute' })
  @Min(0, { message: 'Respiratory rate is 0 to 80 per minute' })
  @IsInt({ message: 'Respiratory rate is a whole number per minute' })
  @IsDefined({ message: 'Enter the respiratory rate' })
  respiratoryRate: number;

  @ApiProperty({ type: 'integer', minimum: 0, maximum: 100, example: 97, description: 'SpO2 in %' })
  @Max(100, { message: 'SpO2 is 0 to 100 %' })
  @Min(0, { message: 'SpO2 is 0 to 100 %' })
  @IsInt({ message: 'SpO2 is a whole number of %' })
  @IsDefined({ message: 'Enter the SpO2' })
  spo2: number;

  @ApiProperty({ type: 'integer', minimum: 0, maximum: 100000, example: 12, description: 'Demands attempted, the pump’s running total' })
  @Max(100000, { message: 'Attempts looks too large: check the pump' })
  @Min(0, { message: 'Attempts cannot be negative' })
  @IsInt({ message: 'Attempts is a whole number from the pump' })
  @IsDefined({ message: 'Enter the attempts from the pump' })
  attempts: number;

  @ApiProperty({ type: 'integer', minimum: 0, maximum: 100000, example: 8, description: 'Doses delivered, the pump’s running total' })
  @Max(100000, { message: 'Delivered looks too large: check the pump' })
  @Min(0, { message: 'Delivered cannot be negative' })
  @IsInt({ message: 'Delivered is a whole number from the pump' })
  @IsDefined({ message: 'Enter the doses delivered from the pump' })
  delivered: number;

  @ApiProperty({ minimum: 0, maximum: 1000, example: 8, description: 'Volume infused, the pump’s running total, in mL' })
  @Max(1000, { message: 'Volume infused looks too large: check the pump' })
  @Min(0, { message: 'Volume infused cannot be negative' })
  @IsNumber(finite, { message: 'Volume infused is a number of mL' })
  @IsDefined({ message: 'Enter the volume infused from the pump' })
  volumeInfusedMl: number;

  @ApiProperty({ minimum: 0, maximum: 1000, example: 42, description: 'Volume left in the syringe, in mL' })
  @Max(1000, { message: 'Syringe remaining looks too large: check the syringe' })
  @Min(0, { message: 'Syringe remaining cannot be negative' })
  @IsNumber(finite, { message: 'Syringe remaining is a number of mL' })
  @IsDefined({ message: 'Enter the volume left in the syringe' })
  syringeRemainingMl: number;

  @ApiProperty({
    type: 'number',
    minimum: 0,
    maximum: 60,
    example: 0,
    description: 'Supplemental oxygen in L/min, always recorded beside SpO2; 0 is air',
  })
  @Max(60, { message: 'Oxygen is 0 (air) to 60 L/min' })
  @Min(0, { message: 'Oxygen is 0 (air) to 60 L/min' })
  @IsNumber(finite, { message: 'Oxygen is a number of litres per minute (0 for air)' })
  @IsDefined({ message: OXYGEN_REQUIRED_MESSAGE })
  oxygenLitresPerMinute: number;

  @ApiPropertyOptional({
    enum: OXYGEN_DEVICES,
    example: 'nasal-cannula',
    description: 'How oxygen is given: required when oxygen is above 0 L/min, refused on air',
  })
  @IsIn(OXYGEN_DEVICES, { message: 'Choose the oxygen device from the list' })
  @IsOptional()
  oxygenDevice?: OxygenDevice | null;

  @ApiPropertyOptional({ type: 'integer', minimum: 0, maximum: 300, example: 78, description: 'Heart rate per minute' })
  @Max(300, { message: 'Heart rate is 0 to 300 per minute' })
  @Min(0, { message: 'Heart rate is 0 to 300 per minute' })
  @IsInt({ message: 'Heart rate is a whole number per minute' })
  @IsOptional()
  heartRate?: number | null;

  @ApiPropertyOptional({ type: 'integer', minimum: 0, maximum: 300, example: 124, description: 'Systolic blood pressure, mmHg' })
  @Max(300, { message: 'Systolic blood pressure is 0 to 300 mmHg' })
  @Min(0, { message: 'Systolic blood pressure is 0 to 300 mmHg' })
  @IsInt({ message: 'Systolic blood pressure is a whole number of mmHg' })
  @IsOptional()
  systolicBp?: number | null;

  @ApiPropertyOptional({ type: 'number', minimum: 25, maximum: 45, example: 36.8, description: 'Temperature, °C' })
  @Max(45, { message: 'Temperature is 25 to 45 °C' })
  @Min(25, { message: 'Temperature is 25 to 45 °C' })
  @IsNumber(finite, { message: 'Temperature is a number of °C' })
  @IsOptional()
  temperatureC?: number | null;

  @ApiPropertyOptional({
    enum: CONSCIOUSNESS_LEVELS,
    example: 'alert',
    description: 'ACVPU: alert, new confusion, voice, pain, unresponsive',
  })
  @IsIn(CONSCIOUSNESS_LEVELS, { message: 'Consciousness is alert, new confusion, voice, pain or unresponsive' })
  @IsOptional()
  consciousness?: Consciousness | null;

  @ApiPropertyOptional({ maxLength: 2000, example: 'Comfortable at rest', description: 'A free-text note' })
  @MaxLength(2000, { message: 'The note is at most 2,000 characters' })
  @IsString({ message: 'The note must be text' })
  @IsOptional()
  note?: string;
}
