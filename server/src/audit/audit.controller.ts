import { Controller, Get, Param, Query } from '@nestjs/common';
import type { AuditEvent, AuditPage, AuditVerifyResult } from '@lockstep/shared';
import type { AuthUser } from '../auth/auth-user.js';
import { CurrentUser } from '../auth/decorators/current-user.decorator.js';
import { Roles } from '../auth/decorators/roles.decorator.js';
import { ParseIdPipe } from '../common/pipes/parse-id.pipe.js';
import { AuditService } from './audit.service.js';
import { AuditQueryDto } from './dto/audit-query.dto.js';

@Controller('audit')
export class AuditController {
  constructor(private readonly audit: AuditService) {}

  @Get()
  @Roles('admin', 'pharmacist')
  search(@Query() query: AuditQueryDto, @CurrentUser() user: AuthUser): Promise<AuditPage> {
    return this.audit.search(query, user);
  }

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

  @Get()
  forOrder(@Param('id', ParseIdPipe) id: number): Promise<AuditEvent[]> {
    return this.audit.forOrder(id);
  }
}
