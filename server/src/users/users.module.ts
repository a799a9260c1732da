import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { AuthModule } from '../auth/auth.module';
import { MailModule } from '../mail/mail.module';
import { Invitation } from './entities/invitation.entity';
import { User } from './entities/user.entity';
import { InvitationsController } from './invitations.controller';
import { InvitationsService } from './invitations.service';
import { UsersController } from './users.controller';
import { UsersService } from './users.service';

@Module({
  imports: [TypeOrmModule.forFeature([User, Invitation]), AuthModule, MailModule],
  controllers: [UsersController, InvitationsController],
  providers: [UsersService, InvitationsService],
})
export class UsersModule {}
