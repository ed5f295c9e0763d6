import { Transform, Type } from 'class-transformer';
import { IsBoolean, IsIn, IsInt, IsOptional, IsPositive } from 'class-validator';
import { ORDER_STATUSES, type OrderStatus } from '@lockstep/shared';
import { ApiPropertyOptional } from '@nestjs/swagger';

export class OrderQueryDto {
  @ApiPropertyOptional({ type: 'integer', minimum: 1, example: 1, description: 'Only orders for this ward’s patients' })
  @IsPositive({ message: 'wardId must be positive' })
  @IsInt({ message: 'wardId must be a whole number' })
  @Type(() => Number)
  @IsOptional()
  wardId?: number;

  @ApiPropertyOptional({ type: 'integer', minimum: 1, example: 1, description: 'Only this patient’s orders' })
  @IsPositive({ message: 'patientId must be positive' })
  @IsInt({ message: 'patientId must be a whole number' })
  @Type(() => Number)
  @IsOptional()
  patientId?: number;

  /** One status, or several separated by commas. */
  @ApiPropertyOptional({
    type: 'string',
    example: 'awaiting_verification,returned',
    description: `One status, or several separated by commas: ${ORDER_STATUSES.join(', ')}`,
  })
  @IsIn(ORDER_STATUSES, { each: true, message: `status must be among: ${ORDER_STATUSES.join(', ')}` })
  @Transform(({ value }) => (typeof value === 'string' ? value.split(',').map((part) => part.trim()) : value))
  @IsOptional()
  status?: OrderStatus[];

  /** Only the caller's own orders (a prescriber's "My orders"). */
  @ApiPropertyOptional({ type: 'boolean', example: true, description: 'Only the caller’s own orders' })
  @IsBoolean({ message: 'mine must be true or false' })
  @Transform(({ value }) => (value === 'true' ? true : value === 'false' ? false : value))
  @IsOptional()
  mine?: boolean;
}
