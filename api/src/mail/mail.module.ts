import { Global, Module } from '@nestjs/common';
import { DevMailController } from './dev-mail.controller';
import { MailQueue } from './mail-queue.service';
import { MailService } from './mail.service';

@Global()
@Module({
  controllers: [DevMailController],
  providers: [MailService, MailQueue],
  exports: [MailService, MailQueue],
})
export class MailModule {}
