import { Injectable, type MessageEvent } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { filter, interval, map, merge, Observable, Subject } from 'rxjs';
import type { DataSource } from 'typeorm';
import { Patient } from '../patients/entities/patient.entity.js';
import { PcaOrder } from '../orders/entities/pca-order.entity.js';

export type WardEventKind = 'order' | 'release' | 'observation' | 'flag' | 'signoff';
type WardEvent = { wardId: number; kind: WardEventKind; orderId: number; at: string };

// Proxies close quiet connections; a comment line now and then keeps the stream open.
const HEARTBEAT_MS = 20_000;

/**
 * Announces changes on a ward (one process; several instances would fan out through the
 * database, see docs/scaling.md). Services publish after their transaction commits, so a
 * listener that refetches sees the change. The handover controller serves the stream.
 */
@Injectable()
export class WardEventsService {
  private readonly events = new Subject<WardEvent>();

  constructor(@InjectDataSource() private readonly dataSource: DataSource) {}

  /** Fire and forget: a failed lookup never fails the clinical action that caused it. */
  publishForOrder(orderId: number, kind: WardEventKind): void {
    this.dataSource.manager
      .createQueryBuilder(PcaOrder, 'o')
      .innerJoin(Patient, 'p', 'p.id = o.patientId')
      .select('p.wardId', 'wardId')
      .where('o.id = :orderId', { orderId })
      .getRawOne<{ wardId: number }>()
      .then((row) => row && this.events.next({ wardId: Number(row.wardId), kind, orderId, at: new Date().toISOString() }))
      .catch(() => undefined);
  }

  stream(wardId: number): Observable<MessageEvent> {
    const changes = this.events.pipe(
      filter((event) => event.wardId === wardId),
      map((event): MessageEvent => ({ type: 'ward-change', data: event })),
    );
    const heartbeat = interval(HEARTBEAT_MS).pipe(map((): MessageEvent => ({ type: 'heartbeat', data: { at: new Date().toISOString() } })));
    return merge(changes, heartbeat);
  }
}
