import { ArrayMaxSize, IsArray, IsDefined, IsIn, IsInt, IsPositive, IsString, Matches, MaxLength, MinLength } from 'class-validator';
import { PASSWORD_MIN_LENGTH, ROLES, type CreateUserRequest, type Role } from '@lockstep/shared';
import { ApiProperty } from '@nestjs/swagger';
import { Trim } from '../../common/validation/trim.decorator.js';

// The decorator nearest the property runs first (see login.dto.ts).
export class CreateUserDto implements CreateUserRequest {
  @ApiProperty({
    minLength: 3,
    maxLength: 64,
    pattern: '^[a-z0-9._-]+$',
    example: 'jo.bloggs',
    description: 'Lower-case letters, digits, dots, dashes and underscores; never changes',
  })
  @Matches(/^[a-z0-9._-]+$/, {
    message: 'Username may use lower-case letters, digits, dots, dashes and underscores',
  })
  @MaxLength(64, { message: 'Username is at most 64 characters' })
  @MinLength(3, { message: 'Username must be at least 3 characters' })
  @IsString({ message: 'username must be text' })
  @IsDefined({ message: 'username is required' })
  username: string;

  @ApiProperty({ minLength: 1, maxLength: 120, example: 'Jo Bloggs', description: 'The name shown on screens and in the audit trail' })
  @Trim()
  @MaxLength(120, { message: 'Display name is at most 120 characters' })
  @MinLength(1, { message: 'Enter a display name' })
  @IsString({ message: 'displayName must be text' })
  @IsDefined({ message: 'displayName is required' })
  displayName: string;

  @ApiProperty({ enum: ROLES, example: 'nurse' })
  @IsIn(ROLES, { message: `role must be one of: ${ROLES.join(', ')}` })
  @IsDefined({ message: 'role is required' })
  role: Role;

  @ApiProperty({
    type: 'integer',
    isArray: true,
    minimum: 1,
    maxItems: 100,
    example: [1],
    description: 'The wards the user works on (an empty list is allowed)',
  })
  @IsPositive({ each: true, message: 'each ward id must be positive' })
  @IsInt({ each: true, message: 'each ward id must be a whole number' })
  @ArrayMaxSize(100, { message: 'wardIds lists at most 100 wards' })
  @IsArray({ message: 'wardIds must be a list of ward ids' })
  @IsDefined({ message: 'wardIds is required (an empty list is allowed)' })
  wardIds: number[];

  @ApiProperty({ format: 'password', minLength: PASSWORD_MIN_LENGTH, maxLength: 256, description: 'The user’s password' })
  @MaxLength(256, { message: 'Password is at most 256 characters' })
  @MinLength(PASSWORD_MIN_LENGTH, { message: `Password must be at least ${PASSWORD_MIN_LENGTH} characters` })
  @IsString({ message: 'password must be text' })
  @IsDefined({ message: 'password is required' })
  password: string;
}
