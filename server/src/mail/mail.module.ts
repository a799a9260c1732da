import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { User } from '../users/entities/user.entity';
import { MailController } from './mail.controller';
import { MailQueue } from './mail-queue';
import { MailService } from './mail.service';

@Module({
  imports: [TypeOrmModule.forFeature([User])],
  controllers: [MailController],
  providers: [MailService, MailQueue],
  exports: [MailService, MailQueue],
})
export class MailModule {}
