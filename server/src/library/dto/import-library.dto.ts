import { Transform, Type } from 'class-transformer';
import { IsBoolean, IsDefined, IsInt, IsOptional, IsPositive, IsString, MaxLength } from 'class-validator';
import type { ImportLibraryFields } from '@lockstep/shared';
import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';

/** The text fields of the multipart upload (the file itself arrives through multer). */
export class ImportLibraryDto implements ImportLibraryFields {
  @ApiProperty({ type: 'integer', minimum: 1, example: 1 })
  @IsPositive({ message: 'wardId must be positive' })
  @IsInt({ message: 'wardId must be a whole number' })
  @Type(() => Number)
  @IsDefined({ message: 'wardId is required' })
  wardId: number;

  @ApiPropertyOptional({ maxLength: 1000, example: 'Imported from the pharmacy spreadsheet' })
  @MaxLength(1000, { message: 'The note is at most 1,000 characters' })
  @IsString({ message: 'note must be text' })
  @IsOptional()
  note?: string;

  /** With dryRun the file is checked and previewed, and nothing is written. */
  @ApiPropertyOptional({ type: 'boolean', example: true, description: 'Check and preview the file; write nothing' })
  @IsBoolean({ message: 'dryRun must be true or false' })
  @Transform(({ value }) => (value === 'true' ? true : value === 'false' ? false : value))
  @IsOptional()
  dryRun?: boolean;
}
