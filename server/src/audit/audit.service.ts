import { ForbiddenException, Injectable, NotFoundException } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { type DataSource, MoreThan } from 'typeorm';
import {
  PHARMACY_AUDIT_ENTITY_TYPES,
  type AuditEvent as AuditEventResponse,
  type AuditPage,
  type AuditVerifyResult,
} from '@lockstep/shared';
import type { AuthUser } from '../auth/auth-user.js';
import { PcaOrder } from '../orders/entities/pca-order.entity.js';
import { auditHash, GENESIS_HASH } from './audit-hash.js';
import type { AuditQueryDto } from './dto/audit-query.dto.js';
import { toAuditEventResponse } from './dto/audit-response.js';
import { AuditEvent } from './entities/audit-event.entity.js';

const DEFAULT_PAGE = 50;
const VERIFY_BATCH = 2000;

/** Reading and checking the audit chain. Writing is `recordAudit`, inside each change's transaction. */
@Injectable()
export class AuditService {
  constructor(@InjectDataSource() private readonly dataSource: DataSource) {}

  async search(query: AuditQueryDto, user: AuthUser): Promise<AuditPage> {
    const allowedTypes = user.role === 'admin' ? null : PHARMACY_AUDIT_ENTITY_TYPES;
    if (allowedTypes && query.entityType && !allowedTypes.includes(query.entityType)) {
      throw new ForbiddenException(`Pharmacists may read the audit of ${allowedTypes.join(' and ')} records only`);
    }
    // A query builder: the filters are optional, and times compare as the stored text (below).
    const builder = this.dataSource.manager.createQueryBuilder(AuditEvent, 'event');
    if (query.entityType) builder.andWhere('event.entityType = :entityType', { entityType: query.entityType });
    else if (allowedTypes) builder.andWhere('event.entityType IN (:...allowedTypes)', { allowedTypes });
    if (query.entityId) builder.andWhere('event.entityId = :entityId', { entityId: query.entityId });
    if (query.userId) builder.andWhere('event.userId = :userId', { userId: query.userId });
    if (query.action) builder.andWhere('event.action = :action', { action: query.action });
    // Stored times are UTC ISO strings, so comparing them as text orders them in time.
    if (query.from) builder.andWhere('event.at >= :from', { from: new Date(query.from).toISOString() });
    if (query.to) builder.andWhere('event.at <= :to', { to: new Date(query.to).toISOString() });
    const [events, total] = await builder
      .orderBy('event.id', 'DESC')
      .take(query.limit ?? DEFAULT_PAGE)
      .skip(query.offset ?? 0)
      .getManyAndCount();
    return { events: events.map(toAuditEventResponse), total };
  }

  /** An order's whole story, oldest first. */
  async forOrder(orderId: number): Promise<AuditEventResponse[]> {
    if (!(await this.dataSource.manager.existsBy(PcaOrder, { id: orderId }))) throw new NotFoundException(`No order with id ${orderId}`);
    const events = await this.dataSource.manager.find(AuditEvent, {
      where: { entityType: 'order', entityId: String(orderId) },
      order: { id: 'ASC' },
    });
    return events.map(toAuditEventResponse);
  }

  /**
   * Walks the chain from the start: each event must follow the previous one's id and hash and
   * hash to its own stored hash. Answers the first event where that fails.
   */
  async verify(): Promise<AuditVerifyResult> {
    let previous = { id: 0, hash: GENESIS_HASH };
    let checked = 0;
    for (;;) {
      const batch = await this.dataSource.manager.find(AuditEvent, {
        where: { id: MoreThan(previous.id) },
        order: { id: 'ASC' },
        take: VERIFY_BATCH,
      });
      for (const event of batch) {
        const { prevHash, hash, ...content } = event;
        const intact = event.id === previous.id + 1 && prevHash === previous.hash && auditHash(prevHash, content) === hash;
        if (!intact) return { ok: false, checked, firstBadId: event.id };
        checked += 1;
        previous = event;
      }
      if (batch.length < VERIFY_BATCH) return { ok: true, checked, firstBadId: null };
    }
  }
}
