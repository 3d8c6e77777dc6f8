import { Inject, Injectable, Logger } from '@nestjs/common';
import { JwtService } from '@nestjs/jwt';
import { InjectDataSource } from '@nestjs/typeorm';
import { DataSource } from 'typeorm';
import { APP_CONFIG, type AppConfig } from '../config/app-config';
import { DomainError } from '../common/domain-error';
import { MailService } from '../mail/mail.service';
import { User } from '../users/user.entity';
import { UserTokensService } from '../users/user-tokens.service';
import { AuditService } from '../audit/audit.service';
import { hashPassword, verifyPassword } from './password';
import type { LoginResponseDto, MeDto } from './dto/auth-response.dto';
import type { JwtPayload } from './jwt.strategy';

// Compared against when the e-mail is unknown, so that case costs as much time as a wrong password.
let dummyHash: Promise<string> | undefined;
const getDummyHash = () => (dummyHash ??= hashPassword('no-such-user-password'));

export const MAX_FAILED_LOGINS = 5;
export const LOCKOUT_MS = 5 * 60_000;

export const toMe = (user: User): MeDto => ({ id: user.id, email: user.email, name: user.name, role: user.role });

@Injectable()
export class AuthService {
  private readonly logger = new Logger(AuthService.name);

  constructor(
    @Inject(APP_CONFIG) private readonly config: AppConfig,
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly jwt: JwtService,
    private readonly tokens: UserTokensService,
    private readonly mail: MailService,
    private readonly audit: AuditService,
  ) {}

  async login(email: string, password: string): Promise<LoginResponseDto> {
    const user = await this.dataSource
      .getRepository(User)
      .createQueryBuilder('u')
      .addSelect('u.passwordHash')
      .where('u.email = :email', { email: email.trim().toLowerCase() })
      .getOne();
    if (user?.lockedUntil && user.lockedUntil.getTime() > Date.now()) {
      const minutes = Math.ceil((user.lockedUntil.getTime() - Date.now()) / 60_000);
      throw new DomainError('AUTH_TEMPORARILY_LOCKED', `Too many failed sign-ins; try again in ${minutes} minute${minutes === 1 ? '' : 's'}`, 429);
    }
    const ok = await verifyPassword(password, user?.passwordHash ?? (await getDummyHash()));
    if (!user || !ok || user.status !== 'active' || !user.passwordHash) {
      if (user) await this.recordFailedLogin(user);
      throw new DomainError('AUTH_BAD_CREDENTIALS', 'E-mail or password is not correct', 401);
    }
    if (user.failedLogins > 0 || user.lockedUntil) await this.dataSource.getRepository(User).update({ id: user.id }, { failedLogins: 0, lockedUntil: null });
    return this.issueToken(user);
  }

  /** After MAX_FAILED_LOGINS wrong passwords in a row the account waits LOCKOUT_MS before the next try. */
  private async recordFailedLogin(user: User): Promise<void> {
    const failures = user.failedLogins + 1;
    const lock = failures >= MAX_FAILED_LOGINS;
    await this.dataSource
      .getRepository(User)
      .update({ id: user.id }, { failedLogins: lock ? 0 : failures, lockedUntil: lock ? new Date(Date.now() + LOCKOUT_MS) : user.lockedUntil });
  }

  issueToken(user: User): LoginResponseDto {
    const payload: JwtPayload = { sub: user.id, role: user.role, tv: user.tokenVersion };
    const accessToken = this.jwt.sign(payload, { expiresIn: this.config.jwt.expiresInSeconds });
    return { accessToken, expiresIn: this.config.jwt.expiresInSeconds, user: toMe(user) };
  }

  async acceptInvitation(token: string, password: string, name?: string): Promise<LoginResponseDto> {
    const passwordHash = await hashPassword(password);
    const user = await this.dataSource.transaction(async (manager) => {
      const row = await this.tokens.consume(manager, token, 'invitation');
      const invited = await manager.findOneByOrFail(User, { id: row.userId });
      if (invited.status === 'deactivated') throw new DomainError('USER_DEACTIVATED', 'This account has been deactivated', 400);
      const changes: Partial<User> = { passwordHash, status: 'active', ...(name ? { name } : {}) };
      await manager.update(User, { id: invited.id }, changes);
      await this.audit.record(manager, { entityType: 'user', entityId: invited.id, action: 'invitation-accepted', userId: invited.id, changes: {} });
      return manager.findOneByOrFail(User, { id: invited.id });
    });
    return this.issueToken(user);
  }

  /** Always succeeds from the caller's point of view, so it does not reveal which e-mails exist. */
  async requestPasswordReset(email: string): Promise<void> {
    const user = await this.dataSource.getRepository(User).findOneBy({ email: email.trim().toLowerCase() });
    if (!user || user.status !== 'active') {
      this.logger.log('password reset asked for an unknown or inactive e-mail');
      return;
    }
    await this.dataSource.transaction(async (manager) => {
      const token = await this.tokens.issue(manager, user.id, 'password-reset');
      await this.mail.send(
        {
          to: user.email,
          subject: 'Reset your Bandwright password',
          text: `Hello ${user.name},\n\nSomeone (hopefully you) asked to reset your Bandwright password.\nSet a new one here within the next hour:\n\n${this.config.appUrl}/reset-password?token=${token}\n\nIf it was not you, ignore this message; your password stays as it is.\n`,
        },
        manager,
      );
    });
    await this.mail.deliverDue();
  }

  async resetPassword(token: string, password: string): Promise<LoginResponseDto> {
    const passwordHash = await hashPassword(password);
    const user = await this.dataSource.transaction(async (manager) => {
      const row = await this.tokens.consume(manager, token, 'password-reset');
      const target = await manager.findOneByOrFail(User, { id: row.userId });
      // A new password revokes every token issued before it.
      await manager.update(User, { id: target.id }, { passwordHash, tokenVersion: target.tokenVersion + 1, failedLogins: 0, lockedUntil: null });
      await this.audit.record(manager, { entityType: 'user', entityId: target.id, action: 'password-reset', userId: target.id, changes: {} });
      return manager.findOneByOrFail(User, { id: target.id });
    });
    return this.issueToken(user);
  }
}
