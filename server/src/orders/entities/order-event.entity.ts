import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, type Relation } from 'typeorm';
import type { OrderStatus } from '@lockstep/shared';
import { User } from '../../users/entities/user.entity.js';
import { PcaOrder } from './pca-order.entity.js';

/** Who moved an order from one status to another, when and why. Rows are only ever added. */
@Entity('order_events')
export class OrderEvent {
  @PrimaryGeneratedColumn()
  id: number;

  @Index()
  @Column({ type: 'integer' })
  orderId: number;

  @ManyToOne(() => PcaOrder, (order) => order.events, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'orderId' })
  order: Relation<PcaOrder>;

  @Column({ type: 'varchar', length: 24, nullable: true })
  fromStatus: OrderStatus | null;

  @Column({ type: 'varchar', length: 24 })
  toStatus: OrderStatus;

  @Column({ type: 'integer' })
  userId: number;

  @ManyToOne(() => User, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'userId' })
  user: Relation<User>;

  @Column({ type: 'datetime' })
  at: Date;

  @Column({ type: 'text', nullable: true })
  reason: string | null;
}
