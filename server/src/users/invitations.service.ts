import { GoneException, Injectable, NotFoundException } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { DEFAULT_TIME_ZONE, formatZonedTime, type InvitationSummary, type LoginResponse } from '@yardcall/shared';
import { DataSource, type EntityManager } from 'typeorm';
import { AuthService } from '../auth/auth.service';
import { hashPassword } from '../auth/password';
import { Invitation } from './entities/invitation.entity';
import { User } from './entities/user.entity';
import { hashInvitationToken, looksLikeInvitationToken } from './invitation-token';

@Injectable()
export class InvitationsService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly auth: AuthService,
  ) {}

  async summary(token: string): Promise<InvitationSummary> {
    const invitation = await this.findUsable(this.dataSource.manager, token);
    const user = invitation.user!;
    return {
      email: user.email,
      name: user.name,
      organizationName: user.organization!.name,
      expiresAt: invitation.expiresAt.toISOString(),
    };
  }

  // Sets the password, activates the account and signs the user in; the link then stops working.
  async accept(token: string, password: string): Promise<LoginResponse> {
    const passwordHash = await hashPassword(password);
    const user = await this.dataSource.transaction(async (manager) => {
      const invitation = await this.findUsable(manager, token, true);
      const now = new Date();
      await manager.update(Invitation, { id: invitation.id }, { acceptedAt: now });
      await manager.update(User, { id: invitation.userId }, { passwordHash, status: 'active' });
      return manager.findOneOrFail(User, { where: { id: invitation.userId }, relations: { organization: true } });
    });
    return this.auth.issue(user);
  }

  private async findUsable(manager: EntityManager, token: string, lock = false): Promise<Invitation> {
    const notFound = new NotFoundException('This invitation link is not valid: ask your administrator for a new one.');
    if (!looksLikeInvitationToken(token)) throw notFound;
    const query = manager
      .createQueryBuilder(Invitation, 'invitation')
      .innerJoinAndSelect('invitation.user', 'user')
      .innerJoinAndSelect('user.organization', 'organization')
      .where('invitation.token_hash = :hash', { hash: hashInvitationToken(token) });
    // Two tabs accepting at once: the second waits and then sees the link as used.
    if (lock) query.setLock('pessimistic_write', undefined, ['invitation']);
    const invitation = await query.getOne();
    if (!invitation) throw notFound;
    if (invitation.acceptedAt) {
      throw new GoneException('This invitation was already used: sign in with your e-mail address and password.');
    }
    if (invitation.expiresAt.getTime() <= Date.now()) {
      throw new GoneException(
        `This invitation expired on ${formatZonedTime(invitation.expiresAt, invitation.user?.organization?.timeZone ?? DEFAULT_TIME_ZONE)}: ask your administrator to send a new one.`,
      );
    }
    return invitation;
  }
}
