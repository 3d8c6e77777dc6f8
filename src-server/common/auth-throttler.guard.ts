import { Injectable } from '@nestjs/common';
import { ThrottlerGuard } from '@nestjs/throttler';
import { DomainError } from './domain-error';

/** Rate limits for sign-in, invitation and reset routes, counted per client address and e-mail. */
@Injectable()
export class AuthThrottlerGuard extends ThrottlerGuard {
  protected override async getTracker(req: Record<string, unknown>): Promise<string> {
    const body = req.body as { email?: unknown } | undefined;
    const email = typeof body?.email === 'string' ? body.email.trim().toLowerCase() : '';
    return `${String(req.ip)}|${email}`;
  }

  protected override async throwThrottlingException(): Promise<void> {
    throw new DomainError('TOO_MANY_REQUESTS', 'Too many attempts; wait a minute and try again', 429);
  }
}
