import { Type } from 'class-transformer';
import { IsIn, IsInt, IsISO8601, IsOptional, IsPositive, Length, Max, Min } from 'class-validator';
import { AUDIT_ACTIONS, AUDIT_ENTITY_TYPES, AUDIT_PAGE_MAX, type AuditEntityType, type AuditQuery } from '@lockstep/shared';
import { ApiPropertyOptional } from '@nestjs/swagger';

export class AuditQueryDto implements AuditQuery {
  @ApiPropertyOptional({ enum: AUDIT_ENTITY_TYPES, example: 'order' })
  @IsIn(AUDIT_ENTITY_TYPES, { message: `entityType must be one of: ${AUDIT_ENTITY_TYPES.join(', ')}` })
  @IsOptional()
  entityType?: AuditEntityType;

  @ApiPropertyOptional({ minLength: 1, maxLength: 64, example: '1' })
  @Length(1, 64, { message: 'entityId is 1 to 64 characters' })
  @IsOptional()
  entityId?: string;

  @ApiPropertyOptional({ type: 'integer', minimum: 1, example: 1, description: 'Events by this user' })
  @IsPositive({ message: 'userId must be positive' })
  @IsInt({ message: 'userId must be a whole number' })
  @Type(() => Number)
  @IsOptional()
  userId?: number;

  @ApiPropertyOptional({ enum: AUDIT_ACTIONS, example: 'order.verify' })
  @IsIn(AUDIT_ACTIONS, { message: 'action is not a known audit action' })
  @IsOptional()
  action?: string;

  @ApiPropertyOptional({ format: 'date-time', example: '2030-01-01T00:00:00Z', description: 'Events at or after' })
  @IsISO8601({ strict: true }, { message: 'from must be an ISO 8601 date-time' })
  @IsOptional()
  from?: string;

  @ApiPropertyOptional({ format: 'date-time', example: '2030-01-02T00:00:00Z', description: 'Events before' })
  @IsISO8601({ strict: true }, { message: 'to must be an ISO 8601 date-time' })
  @IsOptional()
  to?: string;

  @ApiPropertyOptional({ type: 'integer', minimum: 1, maximum: AUDIT_PAGE_MAX, example: 50 })
  @Max(AUDIT_PAGE_MAX, { message: `limit is at most ${AUDIT_PAGE_MAX}` })
  @Min(1, { message: 'limit is at least 1' })
  @IsInt({ message: 'limit must be a whole number' })
  @Type(() => Number)
  @IsOptional()
  limit?: number;

  @ApiPropertyOptional({ type: 'integer', minimum: 0, example: 0 })
  @Min(0, { message: 'offset is at least 0' })
  @IsInt({ message: 'offset must be a whole number' })
  @Type(() => Number)
  @IsOptional()
  offset?: number;
}
