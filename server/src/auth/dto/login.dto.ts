import { IsDefined, IsString, MaxLength, MinLength } from 'class-validator';
import type { LoginRequest } from '@lockstep/shared';
import { ApiProperty } from '@nestjs/swagger';
import { Trim } from '../../common/validation/trim.decorator.js';

// class-validator runs the decorator nearest the property first; with stopAtFirstError the
// basic checks (present, right type) sit nearest so their message is the one shown.
export class LoginDto implements LoginRequest {
  @ApiProperty({ minLength: 1, maxLength: 64, example: 'kai.mendes' })
  @Trim()
  @MaxLength(64, { message: 'Username is at most 64 characters' })
  @MinLength(1, { message: 'Enter your username' })
  @IsString({ message: 'username must be text' })
  @IsDefined({ message: 'username is required' })
  username: string;

  @ApiProperty({ format: 'password', minLength: 1, maxLength: 256 })
  @MaxLength(256, { message: 'Password is at most 256 characters' })
  @MinLength(1, { message: 'Enter your password' })
  @IsString({ message: 'password must be text' })
  @IsDefined({ message: 'password is required' })
  password: string;
}
