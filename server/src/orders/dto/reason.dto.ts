import { IsDefined, IsString, MaxLength, MinLength } from 'class-validator';
import { MIN_REASON_LENGTH, type ReasonRequest } from '@lockstep/shared';
import { ApiProperty } from '@nestjs/swagger';
import { Trim } from '../../common/validation/trim.decorator.js';

export class ReasonDto implements ReasonRequest {
  @ApiProperty({ minLength: MIN_REASON_LENGTH, maxLength: 1000, example: 'Lockout shorter than the ward’s usual: please confirm' })
  @Trim()
  @MaxLength(1000, { message: 'The reason is at most 1,000 characters' })
  @MinLength(MIN_REASON_LENGTH, { message: `Give a reason of at least ${MIN_REASON_LENGTH} characters` })
  @IsString({ message: 'reason must be text' })
  @IsDefined({ message: 'Give a reason' })
  reason: string;
}
