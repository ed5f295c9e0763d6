import { Type } from 'class-transformer';
import { IsInt, IsOptional, IsPositive } from 'class-validator';
import { ApiPropertyOptional } from '@nestjs/swagger';

export class LibraryQueryDto {
  @ApiPropertyOptional({ type: 'integer', minimum: 1, example: 1, description: 'Only this ward’s versions' })
  @IsPositive({ message: 'wardId must be positive' })
  @IsInt({ message: 'wardId must be a whole number' })
  @Type(() => Number)
  @IsOptional()
  wardId?: number;
}
