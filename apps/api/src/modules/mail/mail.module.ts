import { Global, Module } from '@nestjs/common';
import { MailCatcherService } from './mail-catcher.service.js';
import { MailController } from './mail.controller.js';
import { MailRepository } from './mail.repository.js';
import { MailService } from './mail.service.js';

/** Global: any module may send mail. */
@Global()
@Module({
  controllers: [MailController],
  providers: [MailService, MailCatcherService, MailRepository],
  exports: [MailService],
})
export class MailModule {}
