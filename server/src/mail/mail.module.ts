import { Global, Module } from '@nestjs/common';
import { MailCatcherService } from './mail-catcher.service.js';
import { MailService } from './mail.service.js';
import { MailboxController } from './mailbox.controller.js';

@Global()
@Module({
  controllers: [MailboxController],
  providers: [MailCatcherService, MailService],
  exports: [MailService],
})
export class MailModule {}
