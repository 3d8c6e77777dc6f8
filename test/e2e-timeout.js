// Jest reads testTimeout only from the global configuration, so the e2e project sets its own here:
// sign-ins hash with bcrypt, and on a busy 2-core machine a beforeAll can pass jest's 5 s default.
jest.setTimeout(30_000);
