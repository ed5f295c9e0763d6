import { IsDefined, IsString, MaxLength, MinLength } from 'class-validator';
import { MIN_REASON_LENGTH, type SendBackVersionRequest } from '@lockstep/shared';
import { ApiProperty } from '@nestjs/swagger';
import { SignedRequestDto } from '../../common/dto/signature.dto.js';
import { Trim } from '../../common/validation/trim.decorator.js';

/** A reviewing pharmacist sends a submitted version back to draft, signed, saying what to change. */
export class SendBackVersionDto extends SignedRequestDto implements SendBackVersionRequest {
  @ApiProperty({
    minLength: MIN_REASON_LENGTH,
    maxLength: 1000,
    example: 'The 4-hour hard maximum for morphine went from 40 to 400 mg: please check',
    description: 'What needs changing; shown on the version to its authors',
  })
  @Trim()
  @MaxLength(1000, { message: 'The comment is at most 1,000 characters' })
  @MinLength(MIN_REASON_LENGTH, { message: `Give a reason of at least ${MIN_REASON_LENGTH} characters` })
  @IsString({ message: 'comment must be text' })
  @IsDefined({ message: 'Say what needs changing' })
  comment: string;
}
