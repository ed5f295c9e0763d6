import { Type } from 'class-transformer';
import { IsInt, IsOptional, Max, Min } from 'class-validator';
import { ApiPropertyOptional } from '@nestjs/swagger';

export class UsageQueryDto {
  @ApiPropertyOptional({
    type: 'integer',
    minimum: 1,
    maximum: 72,
    default: 24,
    example: 24,
    description: 'The window, in hours back from now',
  })
  @Max(72, { message: 'hours is 1 to 72' })
  @Min(1, { message: 'hours is 1 to 72' })
  @IsInt({ message: 'hours is a whole number from 1 to 72' })
  @Type(() => Number)
  @IsOptional()
  hours?: number;
}
