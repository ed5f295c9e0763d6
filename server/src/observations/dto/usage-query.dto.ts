import { Type } from 'class-transformer';
import { IsInt, IsOptional, Max, Min } from 'class-validator';

export class UsageQueryDto {
  @Max(72, { message: 'hours is 1 to 72' })
  @Min(1, { message: 'hours is 1 to 72' })
  @IsInt({ message: 'hours is a whole number from 1 to 72' })
  @Type(() => Number)
  @IsOptional()
  hours?: number;
}
