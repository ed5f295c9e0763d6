import { Module } from '@nestjs/common';
import { AuditController, OrderAuditController } from './audit.controller.js';
import { AuditService } from './audit.service.js';

@Module({ controllers: [AuditController, OrderAuditController], providers: [AuditService] })
export class AuditModule {}
