import type { DataSourceOptions } from 'typeorm';
import type { AppConfig } from '../config/app-config';
import { ENTITIES } from './entities';
import { MIGRATIONS } from './migrations';

export function dataSourceOptions(config: AppConfig): DataSourceOptions {
  return {
    type: 'mariadb',
    host: config.db.host,
    port: config.db.port,
    username: config.db.user,
    password: config.db.password,
    database: config.db.name,
    entities: ENTITIES,
    migrations: MIGRATIONS,
    synchronize: false,
    migrationsRun: false,
    charset: 'utf8mb4_unicode_ci',
    timezone: 'Z',
    // Fail fast while the database is down instead of queueing requests for minutes.
    connectTimeout: 3000,
    extra: { connectionLimit: 20, waitForConnections: true, queueLimit: 200, enableKeepAlive: true },
  };
}
