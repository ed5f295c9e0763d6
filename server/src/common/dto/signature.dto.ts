import { Type } from 'class-transformer';
import { IsDefined, IsObject, IsString, MaxLength, MinLength, ValidateNested } from 'class-validator';
import type { Signature, SignedRequest } from '@lockstep/shared';
import { ApiProperty } from '@nestjs/swagger';

/** A signature is the signed-in person's password, typed again at the moment of signing. */
export class SignatureDto implements Signature {
  @ApiProperty({ format: 'password', minLength: 1, maxLength: 256, description: 'The signed-in user’s own password, typed again to sign' })
  @MaxLength(256, { message: 'Password is at most 256 characters' })
  @MinLength(1, { message: 'Enter your password to sign' })
  @IsString({ message: 'signature.password must be text' })
  @IsDefined({ message: 'Enter your password to sign' })
  password: string;
}

export class SignedRequestDto implements SignedRequest {
  @ApiProperty({ type: () => SignatureDto })
  @ValidateNested()
  @Type(() => SignatureDto)
  @IsObject({ message: 'signature must be an object with your password' })
  @IsDefined({ message: 'signature is required: enter your password to sign' })
  signature: SignatureDto;
}
