import { Type } from 'class-transformer';
import { IsIn, IsInt, IsISO8601, IsOptional, IsPositive, Length, Max, Min } from 'class-validator';
import { AUDIT_ACTIONS, AUDIT_ENTITY_TYPES, AUDIT_PAGE_MAX, type AuditEntityType, type AuditQuery } from '@lockstep/shared';

export class AuditQueryDto implements AuditQuery {
  @IsIn(AUDIT_ENTITY_TYPES, { message: `entityType must be one of: ${AUDIT_ENTITY_TYPES.join(', ')}` })
  @IsOptional()
  entityType?: AuditEntityType;

  @Length(1, 64, { message: 'entityId is 1 to 64 characters' })
  @IsOptional()
  entityId?: string;

  @IsPositive({ message: 'userId must be positive' })
  @IsInt({ message: 'userId must be a whole number' })
  @Type(() => Number)
  @IsOptional()
  userId?: number;

  @IsIn(AUDIT_ACTIONS, { message: 'action is not a known audit action' })
  @IsOptional()
  action?: string;

  @IsISO8601({ strict: true }, { message: 'from must be an ISO 8601 date-time' })
  @IsOptional()
  from?: string;

  @IsISO8601({ strict: true }, { message: 'to must be an ISO 8601 date-time' })
  @IsOptional()
  to?: string;

  @Max(AUDIT_PAGE_MAX, { message: `limit is at most ${AUDIT_PAGE_MAX}` })
  @Min(1, { message: 'limit is at least 1' })
  @IsInt({ message: 'limit must be a whole number' })
  @Type(() => Number)
  @IsOptional()
  limit?: number;

  @Min(0, { message: 'offset is at least 0' })
  @IsInt({ message: 'offset must be a whole number' })
  @Type(() => Number)
  @IsOptional()
  offset?: number;
}
