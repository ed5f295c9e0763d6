import { ForbiddenException, Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import type { DataSource } from 'typeorm';
import type { OrderDetail } from '@lockstep/shared';
import type { AuthUser } from '../auth/auth-user.js';
import { MailService } from '../mail/mail.service.js';
import { UsersService } from '../users/users.service.js';
import { orderRejectedMail, orderReturnedMail } from './order-notifications.js';
import { transitionOrder } from './order-transitions.js';
import { recordAudit } from '../audit/record-audit.js';
import { OrdersService } from './orders.service.js';
import { WardEventsService } from '../ward-events/ward-events.service.js';

/** Pharmacy's decisions on an order awaiting verification: verify, return with a query, reject. */
@Injectable()
export class OrderReviewService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly orders: OrdersService,
    private readonly users: UsersService,
    private readonly mail: MailService,
    private readonly events: WardEventsService,
  ) {}

  async verify(id: number, pharmacist: AuthUser, password: string): Promise<OrderDetail> {
    await this.users.verifySignature(pharmacist.id, password);
    await this.dataSource.transaction(async (manager) => {
      const order = await this.orders.load(manager, id);
      if (order.prescriberId === pharmacist.id) throw new ForbiddenException('You wrote this order: another pharmacist verifies it');
      await transitionOrder(manager, order, 'verified', pharmacist.id, null, { verifiedById: pharmacist.id, verifiedAt: new Date() });
      await recordAudit(manager, pharmacist, {
        action: 'order.verify',
        entityType: 'order',
        entityId: id,
        summary: { status: { from: order.status, to: 'verified' }, signed: true },
      });
    });
    this.events.publishForOrder(id, 'order');
    return this.orders.get(id);
  }

  async return(id: number, pharmacist: AuthUser, reason: string): Promise<OrderDetail> {
    const order = await this.dataSource.transaction(async (manager) => {
      const found = await this.orders.load(manager, id);
      await transitionOrder(manager, found, 'returned', pharmacist.id, reason.trim());
      await recordAudit(manager, pharmacist, {
        action: 'order.return',
        entityType: 'order',
        entityId: id,
        summary: { status: { from: found.status, to: 'returned' }, reason: reason.trim() },
      });
      return found;
    });
    this.mail.send(orderReturnedMail(order, reason.trim(), pharmacist.displayName));
    this.events.publishForOrder(id, 'order');
    return this.orders.get(id);
  }

  async reject(id: number, pharmacist: AuthUser, reason: string): Promise<OrderDetail> {
    const order = await this.dataSource.transaction(async (manager) => {
      const found = await this.orders.load(manager, id);
      await transitionOrder(manager, found, 'rejected', pharmacist.id, reason.trim());
      await recordAudit(manager, pharmacist, {
        action: 'order.reject',
        entityType: 'order',
        entityId: id,
        summary: { status: { from: found.status, to: 'rejected' }, reason: reason.trim() },
      });
      return found;
    });
    this.mail.send(orderRejectedMail(order, reason.trim(), pharmacist.displayName));
    this.events.publishForOrder(id, 'order');
    return this.orders.get(id);
  }
}
