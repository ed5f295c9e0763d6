import { Transform, Type } from 'class-transformer';
import { IsBoolean, IsIn, IsInt, IsOptional, IsPositive } from 'class-validator';
import { ORDER_STATUSES, type OrderStatus } from '@lockstep/shared';

export class OrderQueryDto {
  @IsPositive({ message: 'wardId must be positive' })
  @IsInt({ message: 'wardId must be a whole number' })
  @Type(() => Number)
  @IsOptional()
  wardId?: number;

  @IsPositive({ message: 'patientId must be positive' })
  @IsInt({ message: 'patientId must be a whole number' })
  @Type(() => Number)
  @IsOptional()
  patientId?: number;

  /** One status, or several separated by commas. */
  @IsIn(ORDER_STATUSES, { each: true, message: `status must be among: ${ORDER_STATUSES.join(', ')}` })
  @Transform(({ value }) => (typeof value === 'string' ? value.split(',').map((part) => part.trim()) : value))
  @IsOptional()
  status?: OrderStatus[];

  /** Only the caller's own orders (a prescriber's "My orders"). */
  @IsBoolean({ message: 'mine must be true or false' })
  @Transform(({ value }) => (value === 'true' ? true : value === 'false' ? false : value))
  @IsOptional()
  mine?: boolean;
}
