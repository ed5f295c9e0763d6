import { IsDefined, IsInt, IsOptional, IsPositive, IsString, MaxLength } from 'class-validator';
import type { CreateDraftRequest } from '@lockstep/shared';
import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';

export class CreateDraftDto implements CreateDraftRequest {
  @ApiProperty({ type: 'integer', minimum: 1, example: 1, description: 'The ward whose library the draft copies' })
  @IsPositive({ message: 'wardId must be positive' })
  @IsInt({ message: 'wardId must be a whole number' })
  @IsDefined({ message: 'wardId is required' })
  wardId: number;

  @ApiPropertyOptional({ maxLength: 1000, example: 'Fentanyl 4-hour limit raised' })
  @MaxLength(1000, { message: 'The note is at most 1,000 characters' })
  @IsString({ message: 'note must be text' })
  @IsOptional()
  note?: string;
}
