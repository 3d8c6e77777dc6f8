import { Inject, Injectable, Logger, OnModuleDestroy, OnModuleInit } from '@nestjs/common';
import { JwtService } from '@nestjs/jwt';
import { InjectDataSource } from '@nestjs/typeorm';
import { DataSource } from 'typeorm';
import { APP_CONFIG, type AppConfig } from '../config/app-config';
import { DomainError } from '../common/domain-error';
import { MailService } from '../mail/mail.service';
import { User } from '../users/user.entity';
import { UserTokensService } from '../users/user-tokens.service';
import { AuditService } from '../audit/audit.service';
import type { AuthUser } from '../common/auth.decorators';
import { LoginAttemptsService } from './login-attempts.service';
import { hashPassword, verifyPassword } from './password';
import type { LoginResponseDto, MeDto } from './dto/auth-response.dto';
import type { JwtPayload } from './jwt.strategy';

// Compared against when the e-mail is unknown, so that case costs as much time as a wrong password.
let dummyHash: Promise<string> | undefined;
const getDummyHash = () => (dummyHash ??= hashPassword('no-such-user-password'));

export const toMe = (user: User): MeDto => ({ id: user.id, email: user.email, name: user.name, role: user.role });

@Injectable()
export class AuthService implements OnModuleInit, OnModuleDestroy {
  private readonly logger = new Logger(AuthService.name);
  /** Reset requests still being handled after their answer went out; awaited on shutdown. */
  private readonly pendingResets = new Set<Promise<void>>();

  constructor(
    @Inject(APP_CONFIG) private readonly config: AppConfig,
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly jwt: JwtService,
    private readonly tokens: UserTokensService,
    private readonly mail: MailService,
    private readonly audit: AuditService,
    private readonly attempts: LoginAttemptsService,
  ) {}

  onModuleInit(): void {
    // Hashed ahead of the first sign-in (without holding up start), so the first unknown e-mail costs no more than a wrong password.
    void getDummyHash();
  }

  async onModuleDestroy(): Promise<void> {
    await Promise.allSettled([...this.pendingResets]);
  }

  /**
   * The attempt is counted per e-mail before the password is checked, so parallel guesses cannot pass
   * the limit, and unknown e-mails count and lock exactly as real ones do.
   */
  async login(email: string, password: string): Promise<LoginResponseDto> {
    const normalised = email.trim().toLowerCase();
    const attempt = await this.attempts.reserve(normalised);
    if (!attempt.allowed) {
      const minutes = Math.ceil(attempt.retryAfterMs / 60_000);
      throw new DomainError('AUTH_TEMPORARILY_LOCKED', `Too many failed sign-ins; try again in ${minutes} minute${minutes === 1 ? '' : 's'}`, 429);
    }
    const user = await this.dataSource
      .getRepository(User)
      .createQueryBuilder('u')
      .addSelect('u.passwordHash')
      .where('u.email = :email', { email: normalised })
      .getOne();
    const ok = await verifyPassword(password, user?.passwordHash ?? (await getDummyHash()));
    if (!user || !ok || user.status !== 'active' || !user.passwordHash) {
      throw new DomainError('AUTH_BAD_CREDENTIALS', 'E-mail or password is not correct', 401);
    }
    await this.attempts.clear(normalised);
    return this.issueToken(user);
  }

  /** Ends every token the user holds: they carry the old token version. */
  async logout(user: AuthUser): Promise<void> {
    await this.dataSource.getRepository(User).increment({ id: user.id }, 'tokenVersion', 1);
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

  /**
   * Answers before the e-mail is even looked up, so a known and an unknown address get the same answer
   * in the same time; the link is queued in the outbox afterwards and the mail poller sends it.
   */
  requestPasswordReset(email: string): void {
    const work = this.queuePasswordReset(email.trim().toLowerCase())
      .catch((error: Error) => this.logger.warn(`password reset request not queued: ${error.message}`))
      .finally(() => this.pendingResets.delete(work));
    this.pendingResets.add(work);
  }

  private async queuePasswordReset(email: string): Promise<void> {
    const user = await this.dataSource.getRepository(User).findOneBy({ email });
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
          carriesLinkToken: true,
        },
        manager,
      );
    });
  }

  async resetPassword(token: string, password: string): Promise<LoginResponseDto> {
    const passwordHash = await hashPassword(password);
    const user = await this.dataSource.transaction(async (manager) => {
      const row = await this.tokens.consume(manager, token, 'password-reset');
      const target = await manager.findOneByOrFail(User, { id: row.userId });
      // A new password revokes every token issued before it.
      await manager.update(User, { id: target.id }, { passwordHash, tokenVersion: target.tokenVersion + 1 });
      await this.audit.record(manager, { entityType: 'user', entityId: target.id, action: 'password-reset', userId: target.id, changes: {} });
      return manager.findOneByOrFail(User, { id: target.id });
    });
    await this.attempts.clear(user.email);
    return this.issueToken(user);
  }
}
