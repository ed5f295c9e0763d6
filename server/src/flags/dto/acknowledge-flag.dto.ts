import { IsDefined, IsString, MaxLength, MinLength } from 'class-validator';
import type { AcknowledgeFlagRequest } from '@lockstep/shared';
import { ApiProperty } from '@nestjs/swagger';
import { Trim } from '../../common/validation/trim.decorator.js';

export class AcknowledgeFlagDto implements AcknowledgeFlagRequest {
  @ApiProperty({
    minLength: 5,
    maxLength: 1000,
    example: 'Naloxone given, prescriber informed',
    description: 'What was done about the flag',
  })
  @Trim()
  @MaxLength(1000, { message: 'The note is at most 1,000 characters' })
  @MinLength(5, { message: 'Say what was done (at least 5 characters)' })
  @IsString({ message: 'The note must be text' })
  @IsDefined({ message: 'Say what was done about the flag' })
  note: string;
}
