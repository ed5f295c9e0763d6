import { Controller, Get, Param, Query } from '@nestjs/common';
import { AUDIT_ROLES, type AuditEvent, type AuditPage, type AuditVerifyResult } from '@lockstep/shared';
import { ApiOperation } from '@nestjs/swagger';
import type { AuthUser } from '../auth/auth-user.js';
import { CurrentUser } from '../auth/decorators/current-user.decorator.js';
import { Roles } from '../auth/decorators/roles.decorator.js';
import { ApiErrors } from '../common/openapi/api-errors.decorator.js';
import { ParseIdPipe } from '../common/pipes/parse-id.pipe.js';
import { AuditService } from './audit.service.js';
import { AuditQueryDto } from './dto/audit-query.dto.js';

@Controller('audit')
export class AuditController {
  constructor(private readonly audit: AuditService) {}

  @ApiOperation({ summary: 'Search the audit trail (pharmacists: orders and library only)' })
  @Get()
  @Roles(...AUDIT_ROLES)
  search(@Query() query: AuditQueryDto, @CurrentUser() user: AuthUser): Promise<AuditPage> {
    return this.audit.search(query, user);
  }

  @ApiOperation({ summary: 'Walk the audit hash chain and name the first broken link' })
  @Get('verify')
  @Roles('admin')
  verify(): Promise<AuditVerifyResult> {
    return this.audit.verify();
  }
}

/** Every role that can open an order can read its story. */
@Controller('orders/:id/audit')
export class OrderAuditController {
  constructor(private readonly audit: AuditService) {}

  @ApiOperation({ summary: 'An order’s audit story' })
  @ApiErrors(404)
  @Get()
  forOrder(@Param('id', ParseIdPipe) id: number): Promise<AuditEvent[]> {
    return this.audit.forOrder(id);
  }
}
