import { Transform, Type } from 'class-transformer';
import { ArrayMaxSize, IsBoolean, IsIn, IsInt, IsOptional, IsPositive } from 'class-validator';
import { ORDER_STATUSES, type OrderStatus } from '@lockstep/shared';
import { ApiPropertyOptional } from '@nestjs/swagger';

export class OrderQueryDto {
  @ApiPropertyOptional({ type: 'integer', minimum: 1, example: 1, description: 'Only orders for this ward’s patients' })
  @IsPositive({ message: 'wardId must be positive' })
  @IsInt({ message: 'wardId must be a whole number' })
  @Type(() => Number)
  @IsOptional()
  wardId?: number;

  /**
   * Several wards at once (a nurse looking after two), separated by commas: `1,4`. Each must be a
   * whole ward id; a blank or non-numeric part is refused (400), never read as "every ward".
   */
  @ApiPropertyOptional({
    type: 'array',
    items: { type: 'integer', minimum: 1 },
    maxItems: 100,
    example: [1, 4],
    description: 'Only orders for these wards’ patients: ward ids separated by commas (1,4), or the parameter repeated',
  })
  @ArrayMaxSize(100, { message: 'wardIds lists at most 100 wards' })
  @IsPositive({ each: true, message: 'wardIds must be positive ward ids' })
  @IsInt({ each: true, message: 'wardIds must be whole ward ids, separated by commas' })
  @Transform(({ value }: { value: unknown }) => {
    const parts = (Array.isArray(value) ? value : [value]).flatMap((part) => (typeof part === 'string' ? part.split(',') : [part]));
    // A blank part becomes NaN (refused as not a whole number), not 0 or "every ward".
    return parts.map((part) => (typeof part === 'string' ? (part.trim() === '' ? Number.NaN : Number(part)) : part));
  })
  @IsOptional()
  wardIds?: number[];

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
