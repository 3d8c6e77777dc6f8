// Tests always run against the test database and the test ports of the local fakes (see scripts/test.sh).
process.env.NODE_ENV = 'test';
process.env.DB_NAME = process.env.DB_NAME || 'bandwright_test';
process.env.S3_PORT = process.env.S3_PORT || '4579';
process.env.SMTP_PORT = process.env.SMTP_PORT || '1026';
process.env.MAIL_WEB_PORT = process.env.MAIL_WEB_PORT || '1081';
process.env.JWT_SECRET = process.env.JWT_SECRET || 'test-secret-not-for-production-0123456789';
