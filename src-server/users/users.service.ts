import { Inject, Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { DataSource } from 'typeorm';
import { APP_CONFIG, type AppConfig } from '../config/app-config';
import { DomainError, NotFoundError } from '../common/domain-error';
import type { AuthUser } from '../common/auth.decorators';
import type { Role } from '../common/roles';
import { AuditService } from '../audit/audit.service';
import { MailService } from '../mail/mail.service';
import { User } from './user.entity';
import { UserTokensService } from './user-tokens.service';
import type { UserResponseDto } from './dto/user-response.dto';
import type { InviteUserDto } from './dto/invite-user.dto';

const toDto = (u: User): UserResponseDto => ({ id: u.id, email: u.email, name: u.name, role: u.role, status: u.status, createdAt: u.createdAt.toISOString() });

@Injectable()
export class UsersService {
  constructor(
    @Inject(APP_CONFIG) private readonly config: AppConfig,
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly tokens: UserTokensService,
    private readonly mail: MailService,
    private readonly audit: AuditService,
  ) {}

  async list(): Promise<UserResponseDto[]> {
    const users = await this.dataSource.getRepository(User).find({ order: { email: 'ASC' } });
    return users.map(toDto);
  }

  /** Creates an invited user and e-mails a single-use link; re-inviting an unaccepted user sends a fresh link. */
  async invite(input: InviteUserDto, actor: AuthUser): Promise<UserResponseDto> {
    const { user } = await this.dataSource.transaction(async (manager) => {
      let user = await manager.findOneBy(User, { email: input.email });
      if (user && user.status !== 'invited') {
        throw new DomainError('USER_EMAIL_TAKEN', `${input.email} already has an account`, 409, { field: 'email' });
      }
      if (!user) {
        const inserted = await manager.insert(User, { email: input.email, name: input.name, role: input.role, status: 'invited' });
        user = await manager.findOneByOrFail(User, { id: inserted.identifiers[0].id });
      } else {
        await manager.update(User, { id: user.id }, { name: input.name, role: input.role });
      }
      await this.audit.record(manager, {
        entityType: 'user',
        entityId: user.id,
        action: 'invited',
        userId: actor.id,
        changes: { email: input.email, role: input.role },
      });
      const token = await this.tokens.issue(manager, user.id, 'invitation');
      const saved = await manager.findOneByOrFail(User, { id: user.id });
      // Queued in the same transaction: no invitation row without its e-mail, and no e-mail without the row;
      // the mail poller sends it, so a slow relay never holds up the answer.
      await this.mail.send(
        {
          to: saved.email,
          subject: 'You are invited to Bandwright',
          text: `Hello ${saved.name},\n\n${actor.name} invited you to Bandwright as ${saved.role}.\nChoose your password here within 72 hours:\n\n${this.config.appUrl}/accept-invitation?token=${token}\n\nThe link works once.\n`,
          carriesLinkToken: true,
        },
        manager,
      );
      return { user: saved };
    });
    return toDto(user);
  }

  async changeRole(id: number, role: Role, actor: AuthUser): Promise<UserResponseDto> {
    return this.update(id, actor, (user) => {
      if (user.id === actor.id && role !== 'admin') throw new DomainError('USER_SELF_DEMOTION', 'You cannot remove your own admin role', 400);
      // A role change revokes existing tokens, which carry the old role.
      return { action: 'role-changed', changes: { role }, bump: true };
    });
  }

  async setActive(id: number, active: boolean, actor: AuthUser): Promise<UserResponseDto> {
    return this.update(id, actor, (user) => {
      if (user.id === actor.id) throw new DomainError('USER_SELF_DEACTIVATION', 'You cannot deactivate yourself', 400);
      if (active && user.status !== 'deactivated') return { action: 'none', changes: {}, bump: false };
      const status = active ? (user.status === 'deactivated' ? 'active' : user.status) : 'deactivated';
      return { action: active ? 'reactivated' : 'deactivated', changes: { status }, bump: !active };
    });
  }

  private async update(
    id: number,
    actor: AuthUser,
    decide: (user: User) => { action: string; changes: Partial<User>; bump: boolean },
  ): Promise<UserResponseDto> {
    return this.dataSource.transaction(async (manager) => {
      const user = await manager.findOne(User, { where: { id }, lock: { mode: 'pessimistic_write' } });
      if (!user) throw new NotFoundError('user', id);
      const { action, changes, bump } = decide(user);
      if (action !== 'none') {
        await manager.update(User, { id }, { ...changes, ...(bump ? { tokenVersion: user.tokenVersion + 1 } : {}) });
        const before = Object.fromEntries(Object.keys(changes).map((k) => [k, [user[k as keyof User], changes[k as keyof User]]]));
        await this.audit.record(manager, { entityType: 'user', entityId: id, action, userId: actor.id, changes: before });
      }
      return toDto(await manager.findOneByOrFail(User, { id }));
    });
  }
}
