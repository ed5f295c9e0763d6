import { type DynamicModule, Module } from '@nestjs/common';
import { ConfigModule } from '@nestjs/config';
import { APP_FILTER } from '@nestjs/core';
import { ServeStaticModule } from '@nestjs/serve-static';
import { AuditModule } from './audit/audit.module.js';
import { AuthModule } from './auth/auth.module.js';
import { BedsideModule } from './bedside/bedside.module.js';
import { AllExceptionsFilter } from './common/filters/all-exceptions.filter.js';
import { IdempotencyModule } from './common/idempotency/idempotency.module.js';
import { clientDistPath } from './config/paths.js';
import { validateEnv } from './config/env.validation.js';
import { DatabaseModule } from './database/database.module.js';
import { DrugsModule } from './drugs/drugs.module.js';
import { EquianalgesicModule } from './equianalgesic/equianalgesic.module.js';
import { FhirModule } from './fhir/fhir.module.js';
import { FlagsModule } from './flags/flags.module.js';
import { HandoverModule } from './handover/handover.module.js';
import { HealthModule } from './health/health.module.js';
import { LibraryModule } from './library/library.module.js';
import { MailModule } from './mail/mail.module.js';
import { ObservationsModule } from './observations/observations.module.js';
import { OrdersModule } from './orders/orders.module.js';
import { PatientsModule } from './patients/patients.module.js';
import { ReleasesModule } from './releases/releases.module.js';
import { UsersModule } from './users/users.module.js';
import { WardsModule } from './wards/wards.module.js';

/** Serves the built client with an index.html fallback for client routes; never for /api or /assets. */
function clientModules(): DynamicModule[] {
  const rootPath = clientDistPath();
  if (!rootPath) return [];
  return [ServeStaticModule.forRoot({ rootPath, exclude: /^\/(api|assets)(\/|$)/ })];
}

@Module({
  imports: [
    ConfigModule.forRoot({ isGlobal: true, validate: validateEnv, ignoreEnvFile: true }),
    DatabaseModule,
    AuthModule,
    UsersModule,
    WardsModule,
    PatientsModule,
    DrugsModule,
    EquianalgesicModule,
    MailModule,
    LibraryModule,
    OrdersModule,
    ReleasesModule,
    FlagsModule,
    BedsideModule,
    ObservationsModule,
    HandoverModule,
    AuditModule,
    FhirModule,
    HealthModule,
    IdempotencyModule,
    ...clientModules(),
  ],
  providers: [{ provide: APP_FILTER, useClass: AllExceptionsFilter }],
})
export class AppModule {}
