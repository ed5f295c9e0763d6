import { Controller, Get } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import type { DataSource } from 'typeorm';
import { ApiOperation } from '@nestjs/swagger';
import { Roles } from '../auth/decorators/roles.decorator.js';
import { MailboxMessage } from './entities/mailbox-message.entity.js';
import type { MailboxMessage as MailboxMessageResponse } from '@lockstep/shared';

/** The local mailbox: what Lockstep has e-mailed, as the embedded catcher received it. */
@Controller('dev/mailbox')
@Roles('admin')
export class MailboxController {
  constructor(@InjectDataSource() private readonly dataSource: DataSource) {}

  @ApiOperation({ summary: 'E-mail the embedded SMTP catcher received, newest first' })
  @Get()
  async list(): Promise<MailboxMessageResponse[]> {
    const messages = await this.dataSource.manager.find(MailboxMessage, { order: { id: 'DESC' }, take: 500 });
    return messages.map(({ id, to, subject, text, at }) => ({ id, to, subject, text, at: at.toISOString() }));
  }
}
