// Tests always run against the test database and the test ports, whatever the shell exported.
process.env.NODE_ENV = 'test';
process.env.DB_NAME = process.env.DB_NAME || 'bandwright_test';
