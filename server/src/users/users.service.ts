import { ConflictException, Injectable, NotFoundException, ServiceUnavailableException } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { InjectDataSource, InjectRepository } from '@nestjs/typeorm';
import { DEFAULT_TIME_ZONE, formatZonedTime, type UserSummary } from '@yardcall/shared';
import { DataSource, Repository } from 'typeorm';
import type { AuthUser } from '../auth/auth-user';
import { isUniqueViolation } from '../common/database-errors';
import type { AppEnv } from '../config/env.validation';
import { MailService } from '../mail/mail.service';
import type { InviteUserDto } from './dto/invite-user.dto';
import type { ListUsersQuery } from './dto/list-users.query';
import type { UpdateUserDto } from './dto/update-user.dto';
import { Invitation } from './entities/invitation.entity';
import { User } from './entities/user.entity';
import { createInvitationToken, hashInvitationToken, INVITATION_TTL_MS } from './invitation-token';
import { toUserSummary } from './user-summary';

@Injectable()
export class UsersService {
  constructor(
    @InjectRepository(User) private readonly users: Repository<User>,
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly mail: MailService,
    private readonly config: ConfigService<AppEnv, true>,
  ) {}

  async list(actor: AuthUser, query: ListUsersQuery): Promise<UserSummary[]> {
    const users = await this.users.find({
      where: {
        organizationId: actor.organizationId,
        ...(query.student === undefined ? {} : { isStudent: query.student }),
        ...(query.role === undefined ? {} : { role: query.role }),
      },
      relations: { organization: true },
      order: { name: 'ASC' },
    });
    return users.map((u) => toUserSummary(u, u.organization!));
  }

  // Creates the invited user and its invitation, and sends the link; if the e-mail fails, nothing is kept.
  async invite(actor: AuthUser, dto: InviteUserDto): Promise<UserSummary> {
    const email = dto.email.trim();
    const taken = await this.users
      .createQueryBuilder('user')
      .where('lower(user.email) = lower(:email)', { email })
      .getExists();
    if (taken) throw this.emailTaken(email);

    const token = createInvitationToken();
    const expiresAt = new Date(Date.now() + INVITATION_TTL_MS);
    try {
      const user = await this.dataSource.transaction(async (manager) => {
        const created = await manager.save(
          manager.create(User, {
            organizationId: actor.organizationId,
            email,
            name: dto.name.trim(),
            role: dto.role,
            isStudent: dto.isStudent ?? false,
            passwordHash: null,
            status: 'invited',
            settings: {},
          }),
        );
        await manager.save(
          manager.create(Invitation, {
            userId: created.id,
            tokenHash: hashInvitationToken(token),
            expiresAt,
            acceptedAt: null,
          }),
        );
        const loaded = await manager.findOneOrFail(User, {
          where: { id: created.id },
          relations: { organization: true },
        });
        await this.sendInvitation(loaded, token, expiresAt);
        return loaded;
      });
      return toUserSummary(user, user.organization!);
    } catch (error) {
      if (isUniqueViolation(error, 'UQ_users_email_lower')) throw this.emailTaken(email);
      throw error;
    }
  }

  async update(actor: AuthUser, id: string, dto: UpdateUserDto): Promise<UserSummary> {
    const user = await this.users.findOne({
      where: { id, organizationId: actor.organizationId },
      relations: { organization: true },
    });
    if (!user) throw new NotFoundException('No user with this id in your organisation.');
    if (user.id === actor.id && dto.role !== undefined && dto.role !== 'admin') {
      throw new ConflictException('You cannot take away your own admin role: ask another admin to do it.');
    }
    if (dto.role !== undefined) user.role = dto.role;
    if (dto.name !== undefined) user.name = dto.name.trim();
    if (dto.isStudent !== undefined) user.isStudent = dto.isStudent;
    await this.users.update({ id: user.id }, { role: user.role, name: user.name, isStudent: user.isStudent });
    return toUserSummary(user, user.organization!);
  }

  private emailTaken(email: string): ConflictException {
    return new ConflictException(`A user with the e-mail address ${email} already exists.`);
  }

  private async sendInvitation(user: User, token: string, expiresAt: Date): Promise<void> {
    const link = `${this.config.get('PUBLIC_URL', { infer: true })}/invite/${token}`;
    const organizationName = user.organization?.name ?? 'your organisation';
    try {
      await this.mail.send({
        to: user.email,
        subject: `You are invited to Yardcall at ${organizationName}`,
        text: [
          `Hello ${user.name},`,
          '',
          `${organizationName} invited you to Yardcall as ${user.role}${user.isStudent ? ' (student)' : ''}.`,
          `Open this link to choose your password: ${link}`,
          '',
          // In the organisation's zone, as its other e-mails are.
          `The link works until ${formatZonedTime(expiresAt, user.organization?.timeZone ?? DEFAULT_TIME_ZONE)} and only once.`,
        ].join('\n'),
      });
    } catch {
      throw new ServiceUnavailableException(
        'The invitation e-mail could not be sent, so nothing was saved. Try again.',
      );
    }
  }
}
