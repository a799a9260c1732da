import { join } from 'node:path';
import { Module } from '@nestjs/common';
import { ConfigModule, ConfigService } from '@nestjs/config';
import { APP_FILTER, APP_PIPE } from '@nestjs/core';
import { ServeStaticModule } from '@nestjs/serve-static';
import { TypeOrmModule } from '@nestjs/typeorm';
import { AuthModule } from './auth/auth.module';
import { ApiExceptionFilter } from './common/api-exception.filter';
import { createValidationPipe } from './common/validation';
import { validateEnv, type AppEnv } from './config/env.validation';
import { buildDataSourceOptions } from './database/data-source';
import { DefectsModule } from './defects/defects.module';
import { FleetModule } from './fleet/fleet.module';
import { HealthModule } from './health/health.module';
import { InspectionsModule } from './inspections/inspections.module';
import { JobsModule } from './jobs/jobs.module';
import { MailModule } from './mail/mail.module';
import { NotesModule } from './notes/notes.module';
import { OrganizationsModule } from './organizations/organizations.module';
import { ReportsModule } from './reports/reports.module';
import { StorageModule } from './storage/storage.module';
import { TrainingModule } from './training/training.module';
import { UsersModule } from './users/users.module';
import { VehiclesModule } from './vehicles/vehicles.module';

// The client's run route, /driver/inspections/:clientId (not its /finish).
const RUN_PAGE_ROOT = '/driver/inspections';
const RUN_PAGE_PATH = '/:clientId';

// The environment is the only configuration source (no .env file), checked once at boot. forRoot answers a
// promise that a bad value rejects; NestFactory.create then rejects with that sentence. The no-op catch only
// keeps Node from calling the rejection unhandled before Nest awaits it.
const configModule = ConfigModule.forRoot({ isGlobal: true, ignoreEnvFile: true, validate: validateEnv });
void configModule.catch(() => undefined);

@Module({
  imports: [
    configModule,
    TypeOrmModule.forRootAsync({
      inject: [ConfigService],
      useFactory: (config: ConfigService<AppEnv, true>) => ({
        ...buildDataSourceOptions(config.get('DATABASE_URL', { infer: true })),
        // Fail fast at boot instead of retrying for half a minute.
        retryAttempts: 2,
        retryDelay: 500,
      }),
    }),
    ServeStaticModule.forRootAsync({
      inject: [ConfigService],
      useFactory: (config: ConfigService<AppEnv, true>) => {
        const clientDist = config.get('CLIENT_DIST', { infer: true });
        if (!clientDist) return [];
        return [
          // A walk-around's run route opened cold gets the glove screen's own light page. Mounted under
          // the run routes only: at the root this folder would answer /index.html (which the service
          // worker precaches as the app) with the run page.
          {
            rootPath: join(clientDist, 'driver-run'),
            serveRoot: RUN_PAGE_ROOT,
            renderPath: RUN_PAGE_PATH,
            serveStaticOptions: { index: false },
          },
          // The SPA gets every other path outside /api; /api paths fall through to the API (and its 404).
          { rootPath: clientDist, exclude: /^\/api(\/|$)/ },
        ];
      },
    }),
    JobsModule,
    AuthModule,
    OrganizationsModule,
    UsersModule,
    VehiclesModule,
    InspectionsModule,
    DefectsModule,
    FleetModule,
    StorageModule,
    NotesModule,
    ReportsModule,
    TrainingModule,
    MailModule,
    HealthModule,
  ],
  providers: [
    { provide: APP_PIPE, useFactory: createValidationPipe },
    { provide: APP_FILTER, useClass: ApiExceptionFilter },
  ],
})
export class AppModule {}
