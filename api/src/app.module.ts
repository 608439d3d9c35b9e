import { Module } from '@nestjs/common';
import { ConfigModule, ConfigService } from '@nestjs/config';
import { AuditModule } from './audit/audit.module';
import { APP_FILTER, APP_GUARD, APP_PIPE } from '@nestjs/core';
import { ThrottlerModule } from '@nestjs/throttler';
import { TypeOrmModule } from '@nestjs/typeorm';
import { DataSource } from 'typeorm';
import { AuthModule } from './auth/auth.module';
import { CatalogModule } from './catalog/catalog.module';
import { AllExceptionsFilter } from './common/filters/all-exceptions.filter';
import { JwtAuthGuard } from './common/guards/jwt-auth.guard';
import { RolesGuard } from './common/guards/roles.guard';
import { createValidationPipe } from './common/pipes/validation.pipe';
import { AppConfigService } from './config/app-config';
import { validateEnv } from './config/env.validation';
import { CustomersModule } from './customers/customers.module';
import { FitReportsModule } from './fit-reports/fit-reports.module';
import { PartsModule } from './parts/parts.module';
import { buildDataSourceOptions } from './database/typeorm-options';
import { HealthModule } from './health/health.module';
import { InvitationsModule } from './invitations/invitations.module';
import { JobsModule } from './jobs/jobs.module';
import { LaborOperationsModule } from './labor-operations/labor-operations.module';
import { MailModule } from './mail/mail.module';
import { MeasurementsModule } from './measurements/measurements.module';
import { MembershipsModule } from './memberships/memberships.module';
import { ProjectsModule } from './projects/projects.module';
import { MariaDbThrottlerStorage } from './rate-limits/mariadb-throttler.storage';
import { PaymentsModule } from './payments/payments.module';
import { QuotesModule } from './quotes/quotes.module';
import { ShopsModule } from './shops/shops.module';
import { UsersModule } from './users/users.module';
import { WebStaticModule } from './web-static/web-static.module';
import { WorkOrdersModule } from './work-orders/work-orders.module';

@Module({
  imports: [
    ConfigModule.forRoot({ isGlobal: true, ignoreEnvFile: true, cache: true, validate: validateEnv }),
    TypeOrmModule.forRootAsync({
      inject: [ConfigService],
      useFactory: (config: AppConfigService) => ({
        ...buildDataSourceOptions({
          DB_HOST: config.get('DB_HOST', { infer: true }),
          DB_PORT: config.get('DB_PORT', { infer: true }),
          DB_USER: config.get('DB_USER', { infer: true }),
          DB_PASSWORD: config.get('DB_PASSWORD', { infer: true }),
          DB_NAME: config.get('DB_NAME', { infer: true }),
          DB_REPLICA_HOSTS: config.get('DB_REPLICA_HOSTS', { infer: true }),
        }),
        retryAttempts: 3,
        retryDelay: 1000,
      }),
    }),
    // Used by @AuthRateLimited() routes only (no global throttling); counted in MariaDB, shared by every instance.
    ThrottlerModule.forRootAsync({
      inject: [ConfigService, DataSource],
      useFactory: (config: AppConfigService, dataSource: DataSource) => ({
        storage: new MariaDbThrottlerStorage(dataSource),
        throttlers: [
          { ttl: config.get('AUTH_RATE_WINDOW_SECONDS', { infer: true }) * 1000, limit: config.get('AUTH_RATE_LIMIT', { infer: true }) },
        ],
      }),
    }),
    MailModule,
    AuditModule,
    JobsModule,
    UsersModule,
    ShopsModule,
    MembershipsModule,
    AuthModule,
    InvitationsModule,
    CustomersModule,
    ProjectsModule,
    CatalogModule,
    FitReportsModule,
    MeasurementsModule,
    PartsModule,
    LaborOperationsModule,
    QuotesModule,
    WorkOrdersModule,
    PaymentsModule,
    HealthModule,
    // Last: the built web app for every non-API path.
    WebStaticModule,
  ],
  providers: [
    { provide: APP_FILTER, useClass: AllExceptionsFilter },
    { provide: APP_PIPE, useFactory: createValidationPipe },
    // Order matters: authentication first, then the role check.
    { provide: APP_GUARD, useClass: JwtAuthGuard },
    { provide: APP_GUARD, useClass: RolesGuard },
  ],
})
export class AppModule {}
