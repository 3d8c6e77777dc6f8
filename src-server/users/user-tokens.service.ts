import { Injectable } from '@nestjs/common';
import { EntityManager, IsNull } from 'typeorm';
import { DomainError } from '../common/domain-error';
import { hashLinkToken, newLinkToken } from '../auth/password';
import { UserToken, UserTokenPurpose } from './user-token.entity';

const LIFETIME_MS: Record<UserTokenPurpose, number> = {
  invitation: 72 * 3600 * 1000,
  'password-reset': 3600 * 1000,
};

/** Single-use, expiring tokens for e-mailed links. */
@Injectable()
export class UserTokensService {
  async issue(manager: EntityManager, userId: number, purpose: UserTokenPurpose): Promise<string> {
    // A new link supersedes any earlier unused one of the same purpose.
    await manager.update(UserToken, { userId, purpose, usedAt: IsNull() }, { usedAt: new Date() });
    const { token, hash } = newLinkToken();
    await manager.insert(UserToken, { userId, purpose, tokenHash: hash, expiresAt: new Date(Date.now() + LIFETIME_MS[purpose]) });
    return token;
  }

  /** Marks the token used inside the caller's transaction; the row lock makes a second use fail. */
  async consume(manager: EntityManager, token: string, purpose: UserTokenPurpose): Promise<UserToken> {
    const row = await manager
      .getRepository(UserToken)
      .createQueryBuilder('t')
      .setLock('pessimistic_write')
      .where('t.token_hash = :hash AND t.purpose = :purpose', { hash: hashLinkToken(token), purpose })
      .getOne();
    if (!row) throw new DomainError('LINK_TOKEN_INVALID', 'This link is not valid', 400);
    if (row.usedAt) throw new DomainError('LINK_TOKEN_USED', 'This link has already been used', 400);
    if (row.expiresAt.getTime() < Date.now()) throw new DomainError('LINK_TOKEN_EXPIRED', 'This link has expired; ask for a new one', 400);
    await manager.update(UserToken, { id: row.id }, { usedAt: new Date() });
    return row;
  }
}
