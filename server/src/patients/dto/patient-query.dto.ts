import { Type } from 'class-transformer';
import { IsInt, IsOptional, IsPositive } from 'class-validator';
import { ApiPropertyOptional } from '@nestjs/swagger';

export class PatientQueryDto {
  @ApiPropertyOptional({ type: 'integer', minimum: 1, example: 1, description: 'Only this ward’s patients' })
  @IsPositive({ message: 'wardId must be positive' })
  @IsInt({ message: 'wardId must be a whole number' })
  @Type(() => Number)
  @IsOptional()
  wardId?: number;
}
