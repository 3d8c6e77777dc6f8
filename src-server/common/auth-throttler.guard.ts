import { Injectable } from '@nestjs/common';
import { normalizeIp, ThrottlerGuard, type ThrottlerOptions } from '@nestjs/throttler';
import { createHash } from 'node:crypto';
import { DomainError } from './domain-error';

/** Requests per minute on the sign-in, invitation and reset routes from one client address and e-mail, per route. */
export const ADDRESS_AND_EMAIL_LIMIT = 30;
/** Requests per minute on all of those routes together from one client address, whatever the e-mails. */
export const ADDRESS_LIMIT = 100;

// req.ip is the socket peer, or the X-Forwarded-For entry added by a proxy on loopback ('trust proxy' in app.setup.ts).
const clientAddress = (req: Record<string, unknown>): string => normalizeIp(String(req.ip));

/** The limits AuthThrottlerGuard applies; their counters live in the database (DatabaseThrottlerStorage). */
export const AUTH_THROTTLERS: ThrottlerOptions[] = [
  {
    name: 'address-and-email',
    ttl: 60_000,
    limit: ADDRESS_AND_EMAIL_LIMIT,
    getTracker: (req) => {
      const body = req.body as { email?: unknown } | undefined;
      const email = typeof body?.email === 'string' ? body.email.trim().toLowerCase() : '';
      return `${clientAddress(req)}|${email}`;
    },
  },
  {
    name: 'address',
    ttl: 60_000,
    limit: ADDRESS_LIMIT,
    getTracker: clientAddress,
    // One count across every guarded route, so spreading guesses over routes does not multiply the allowance.
    generateKey: (_context, tracker, name) => createHash('sha256').update(`${name}|${tracker}`).digest('hex'),
  },
];

/** Rate limits for sign-in, invitation and reset routes (AUTH_THROTTLERS). */
@Injectable()
export class AuthThrottlerGuard extends ThrottlerGuard {
  protected override async throwThrottlingException(): Promise<void> {
    throw new DomainError('TOO_MANY_REQUESTS', 'Too many attempts; wait a minute and try again', 429);
  }
}
