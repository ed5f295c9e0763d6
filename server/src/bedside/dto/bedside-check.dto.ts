import { Type } from 'class-transformer';
import { IsDefined, IsISO8601, IsObject, IsString, Matches, MaxLength, MinLength, ValidateNested } from 'class-validator';
import type { ColleagueRequest, FirstCheckRequest, SecondCheckRequest } from '@lockstep/shared';
import { ApiProperty } from '@nestjs/swagger';
import { Trim } from '../../common/validation/trim.decorator.js';
import { PumpSettingsDto } from './pump-settings.dto.js';

export class FirstCheckDto implements FirstCheckRequest {
  @ApiProperty({ minLength: 1, maxLength: 32, example: 'KB100231', description: 'MRN from the patient’s wristband' })
  @MaxLength(32, { message: 'MRN is at most 32 characters' })
  @MinLength(1, { message: 'Enter the MRN from the wristband' })
  @IsString({ message: 'Enter the MRN from the wristband' })
  @IsDefined({ message: 'Enter the MRN from the wristband' })
  patientMrn: string;

  // ISO 8601 alone also takes 1968, 1968-W11-4 or a date and time: a wristband shows a day.
  @ApiProperty({
    format: 'date',
    pattern: '^\\d{4}-\\d{2}-\\d{2}$',
    example: '1968-03-14',
    description: 'Date of birth from the wristband (yyyy-mm-dd)',
  })
  @Matches(/^\d{4}-\d{2}-\d{2}$/, { message: 'Enter the date of birth from the wristband (yyyy-mm-dd)' })
  @IsISO8601({ strict: true }, { message: 'Enter the date of birth from the wristband (yyyy-mm-dd)' })
  @IsDefined({ message: 'Enter the date of birth from the wristband' })
  patientDateOfBirth: string;

  @ApiProperty({ minLength: 1, maxLength: 16, example: 'HK3-7QT', description: 'The release code on the syringe label' })
  @MaxLength(16, { message: 'A release code is 6 characters' })
  @MinLength(1, { message: 'Enter the release code from the syringe label' })
  @IsString({ message: 'Enter the release code from the syringe label' })
  @IsDefined({ message: 'Enter the release code from the syringe label' })
  releaseCode: string;

  @ApiProperty({ type: () => PumpSettingsDto, description: 'What the first nurse reads off the pump' })
  @ValidateNested()
  @Type(() => PumpSettingsDto)
  @IsObject({ message: 'Enter the pump settings' })
  @IsDefined({ message: 'Enter the pump settings' })
  settings: PumpSettingsDto;
}

/** A colleague signs in on the same screen: username and password. */
export class ColleagueDto implements ColleagueRequest {
  @ApiProperty({ minLength: 1, maxLength: 64, example: 'rosa.adeyemi', description: 'The colleague’s username' })
  @Trim()
  @MaxLength(64, { message: 'Username is at most 64 characters' })
  @MinLength(1, { message: 'Enter the username' })
  @IsString({ message: 'Enter the username' })
  @IsDefined({ message: 'Enter the username' })
  username: string;

  @ApiProperty({ format: 'password', minLength: 1, maxLength: 256, description: 'The colleague’s own password' })
  @MaxLength(256, { message: 'Password is at most 256 characters' })
  @MinLength(1, { message: 'Enter the password' })
  @IsString({ message: 'Enter the password' })
  @IsDefined({ message: 'Enter the password' })
  password: string;
}

export class SecondCheckDto extends ColleagueDto implements SecondCheckRequest {
  @ApiProperty({ type: () => PumpSettingsDto, description: 'What the second nurse reads off the pump, independently' })
  @ValidateNested()
  @Type(() => PumpSettingsDto)
  @IsObject({ message: 'Enter the pump settings' })
  @IsDefined({ message: 'Enter the pump settings' })
  settings: PumpSettingsDto;
}
