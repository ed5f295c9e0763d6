import { Type } from 'class-transformer';
import { IsDefined, IsISO8601, IsObject, IsString, MaxLength, MinLength, ValidateNested } from 'class-validator';
import { Trim } from '../../common/validation/trim.decorator.js';
import { PumpSettingsDto } from './pump-settings.dto.js';

export class FirstCheckDto {
  @MaxLength(32, { message: 'MRN is at most 32 characters' })
  @MinLength(1, { message: 'Enter the MRN from the wristband' })
  @IsString({ message: 'Enter the MRN from the wristband' })
  @IsDefined({ message: 'Enter the MRN from the wristband' })
  patientMrn: string;

  @IsISO8601({ strict: true }, { message: 'Enter the date of birth from the wristband (yyyy-mm-dd)' })
  @IsDefined({ message: 'Enter the date of birth from the wristband' })
  patientDateOfBirth: string;

  @MaxLength(16, { message: 'A release code is 6 characters' })
  @MinLength(1, { message: 'Enter the release code from the syringe label' })
  @IsString({ message: 'Enter the release code from the syringe label' })
  @IsDefined({ message: 'Enter the release code from the syringe label' })
  releaseCode: string;

  @ValidateNested()
  @Type(() => PumpSettingsDto)
  @IsObject({ message: 'Enter the pump settings' })
  @IsDefined({ message: 'Enter the pump settings' })
  settings: PumpSettingsDto;
}

/** A colleague signs in on the same screen: username and password. */
export class ColleagueDto {
  @Trim()
  @MaxLength(64, { message: 'Username is at most 64 characters' })
  @MinLength(1, { message: 'Enter the username' })
  @IsString({ message: 'Enter the username' })
  @IsDefined({ message: 'Enter the username' })
  username: string;

  @MaxLength(256, { message: 'Password is at most 256 characters' })
  @MinLength(1, { message: 'Enter the password' })
  @IsString({ message: 'Enter the password' })
  @IsDefined({ message: 'Enter the password' })
  password: string;
}

export class SecondCheckDto extends ColleagueDto {
  @ValidateNested()
  @Type(() => PumpSettingsDto)
  @IsObject({ message: 'Enter the pump settings' })
  @IsDefined({ message: 'Enter the pump settings' })
  settings: PumpSettingsDto;
}
