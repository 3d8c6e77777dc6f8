import { type DynamicModule, Module } from '@nestjs/common';
import { APP_FILTER, APP_GUARD, APP_PIPE } from '@nestjs/core';
import { TypeOrmModule } from '@nestjs/typeorm';
import { DataSource } from 'typeorm';
import { ServeStaticModule } from '@nestjs/serve-static';
import { ThrottlerModule } from '@nestjs/throttler';
import { resolve } from 'node:path';
import { APP_CONFIG, type AppConfig } from './config/app-config';
import { ConfigModule } from './config/config.module';
import { AllExceptionsFilter } from './common/all-exceptions.filter';
import { JwtAuthGuard } from './common/jwt-auth.guard';
import { AUTH_THROTTLERS } from './common/auth-throttler.guard';
import { DatabaseThrottlerStorage } from './common/database-throttler-storage';
import { createValidationPipe } from './common/validation';
import { dataSourceOptions } from './database/data-source-options';
import { AuditModule } from './audit/audit.module';
import { AuthModule } from './auth/auth.module';
import { HealthModule } from './health/health.module';
import { MailModule } from './mail/mail.module';
import { StorageModule } from './storage/storage.module';
import { UsersModule } from './users/users.module';
import { RfToolsModule } from './rf-tools/rf-tools.module';
import { BandsModule } from './bands/bands.module';
import { RegulatoryModule } from './regulatory/regulatory.module';
import { ProductsModule } from './products/products.module';
import { PartsModule } from './parts/parts.module';
import { CompatibilityModule } from './compatibility/compatibility.module';
import { ReportsModule } from './reports/reports.module';

@Module({
  imports: [
    TypeOrmModule.forRootAsync({
      inject: [APP_CONFIG],
      useFactory: (config: AppConfig) => ({ ...dataSourceOptions(config), retryAttempts: 20, retryDelay: 1000 }),
    }),
    // Only the routes that opt in with AuthThrottlerGuard are limited (sign-in, invitations, resets);
    // the counters are in the database so that several instances share one allowance.
    ThrottlerModule.forRootAsync({
      inject: [DataSource],
      useFactory: (dataSource: DataSource) => ({ throttlers: AUTH_THROTTLERS, storage: new DatabaseThrottlerStorage(dataSource) }),
    }),
    // Async: the configuration reaches it through APP_CONFIG, as it reaches every other module.
    ServeStaticModule.forRootAsync({
      inject: [APP_CONFIG],
      useFactory: (config: AppConfig) => [{ rootPath: resolve(config.clientDir), exclude: ['/api/{*path}'] }],
    }),
    AuditModule,
    MailModule,
    StorageModule,
    HealthModule,
    AuthModule,
    UsersModule,
    RfToolsModule,
    BandsModule,
    RegulatoryModule,
    ProductsModule,
    PartsModule,
    CompatibilityModule,
    ReportsModule,
  ],
  providers: [
    { provide: APP_PIPE, useFactory: createValidationPipe },
    { provide: APP_FILTER, useClass: AllExceptionsFilter },
    { provide: APP_GUARD, useClass: JwtAuthGuard },
  ],
})
export class AppModule {
  /** The app with the configuration its entry point loaded and validated once (main.ts, or the test harness). */
  static forRoot(config: AppConfig): DynamicModule {
    return { module: AppModule, imports: [ConfigModule.forRoot(config)] };
  }
}
