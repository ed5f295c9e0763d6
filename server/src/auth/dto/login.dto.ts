import { IsDefined, IsString, MaxLength, MinLength } from 'class-validator';
import type { LoginRequest } from '@lockstep/shared';
import { Trim } from '../../common/validation/trim.decorator.js';

// class-validator runs the decorator nearest the property first; with stopAtFirstError the
// basic checks (present, right type) sit nearest so their message is the one shown.
export class LoginDto implements LoginRequest {
  @Trim()
  @MaxLength(64, { message: 'Username is at most 64 characters' })
  @MinLength(1, { message: 'Enter your username' })
  @IsString({ message: 'username must be text' })
  @IsDefined({ message: 'username is required' })
  username: string;

  @MaxLength(256, { message: 'Password is at most 256 characters' })
  @MinLength(1, { message: 'Enter your password' })
  @IsString({ message: 'password must be text' })
  @IsDefined({ message: 'password is required' })
  password: string;
}
