import { Type } from 'class-transformer';
import { IsInt, IsOptional, IsPositive } from 'class-validator';

export class LibraryQueryDto {
  @IsPositive({ message: 'wardId must be positive' })
  @IsInt({ message: 'wardId must be a whole number' })
  @Type(() => Number)
  @IsOptional()
  wardId?: number;
}
