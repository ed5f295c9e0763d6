import { Column, Entity, PrimaryGeneratedColumn } from 'typeorm';

/** A message the embedded SMTP catcher received (local demo and tests; never a real mailbox). */
@Entity('mailbox_messages')
export class MailboxMessage {
  @PrimaryGeneratedColumn()
  id: number;

  @Column({ type: 'text' })
  to: string;

  @Column({ type: 'text' })
  subject: string;

  @Column({ type: 'text' })
  text: string;

  @Column({ type: 'datetime' })
  at: Date;
}
