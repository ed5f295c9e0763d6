import { IsOptional, IsString, MaxLength } from 'class-validator';
import type { SubmitVersionRequest } from '@lockstep/shared';
import { ApiPropertyOptional } from '@nestjs/swagger';

export class SubmitVersionDto implements SubmitVersionRequest {
  @ApiPropertyOptional({ maxLength: 1000, example: 'Ready for a second pharmacist' })
  @MaxLength(1000, { message: 'The note is at most 1,000 characters' })
  @IsString({ message: 'note must be text' })
  @IsOptional()
  note?: string;
}
