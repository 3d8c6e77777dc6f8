/**
 * A client address of its own (documentation range, RFC 3849), sent as X-Forwarded-For from loopback: the sign-in
 * limits count per address in the database, so the suite's many sign-ins must not spend one shared allowance.
 */
export const testClientAddress = () => `2001:db8:${Math.floor(Math.random() * 0xffff).toString(16)}:${Math.floor(Math.random() * 0xffff).toString(16)}::1`;
