import { Module, RequestMethod, type DynamicModule, type Type } from '@nestjs/common';
import { ConfigModule, ConfigService } from '@nestjs/config';
import { APP_FILTER, APP_GUARD } from '@nestjs/core';
import { ServeStaticModule } from '@nestjs/serve-static';
import { ThrottlerGuard, ThrottlerModule } from '@nestjs/throttler';
import { TypeOrmModule } from '@nestjs/typeorm';
import { DataSource } from 'typeorm';
import { LoggerModule } from 'nestjs-pino';
import { existsSync } from 'node:fs';
import { join } from 'node:path';
import { AuthModule } from './auth/auth.module';
import { CacheModule } from './common/cache/cache.module';
import { CodesModule } from './codes/codes.module';
import { AllExceptionsFilter } from './common/filters/http-exception.filter';
import { JwtAuthGuard } from './common/guards/jwt-auth.guard';
import { RolesGuard } from './common/guards/roles.guard';
import { appConfig, authConfig, mailConfig, type AppConfig } from './config/configuration';
import { validateEnv } from './config/env.validation';
import { dataSourceOptions } from './database/data-source';
import { DatabaseThrottlerStorage, throttleInDatabase } from './database/db-throttler-storage';
import { initializeAndMigrate } from './database/startup-lock';
import { DatabaseModule } from './database/database.module';
import { HealthController } from './health/health.controller';
import { KnowledgeModule } from './knowledge/knowledge.module';
import { EstimatesModule } from './estimates/estimates.module';
import { FieldReportsModule } from './field-reports/field-reports.module';
import { InsightsModule } from './insights/insights.module';
import { ImportsModule } from './imports/imports.module';
import { JobsModule } from './jobs/jobs.module';
import { VehiclesModule } from './vehicles/vehicles.module';
import { SeedModule } from './seed/seed.module';
import { ShopsModule } from './shops/shops.module';
import { UsersModule } from './users/users.module';

/** The built client, served at / with index.html for client routes, when it has been built. */
function clientModules(): Array<DynamicModule | Type> {
  const root = process.env.CLIENT_DIST ?? join(__dirname, '..', '..', 'frontend', 'dist');
  if (!existsSync(join(root, 'index.html'))) return [];
  return [ServeStaticModule.forRoot({ rootPath: root, exclude: ['/api/{*path}'], serveStaticOptions: { maxAge: '1h', index: false } })];
}

@Module({
  imports: [
    ConfigModule.forRoot({ isGlobal: true, load: [appConfig, authConfig, mailConfig], validate: validateEnv, cache: true }),
    LoggerModule.forRootAsync({
      inject: [ConfigService],
      useFactory: (config: ConfigService) => ({
        // Express 5 path syntax, so Nest needs no legacy-route conversion.
        forRoutes: [{ path: '{*path}', method: RequestMethod.ALL }],
        pinoHttp: {
          level: config.get<AppConfig>('app')!.logLevel,
          // Never log credentials.
          redact: ['req.headers.authorization', 'req.headers.cookie'],
          autoLogging: { ignore: (req) => !(req.url ?? '').startsWith('/api') },
        },
      }),
    }),
    TypeOrmModule.forRootAsync({
      useFactory: () => ({ ...dataSourceOptions(), autoLoadEntities: true }),
      // Pending migrations run at start, one instance at a time (database/startup-lock.ts).
      dataSourceFactory: (options) => initializeAndMigrate(options!),
    }),
    // Counts live in the database when several instances may share it (PostgreSQL), else in memory.
    ThrottlerModule.forRootAsync({
      inject: [DataSource],
      useFactory: (dataSource: DataSource) => ({
        throttlers: [{ name: 'default', ttl: 60_000, limit: () => Number(process.env.THROTTLE_LIMIT ?? 6000) }],
        storage: throttleInDatabase() ? new DatabaseThrottlerStorage(dataSource) : undefined,
      }),
    }),
    ...clientModules(),
    DatabaseModule,
    CacheModule,
    ShopsModule,
    AuthModule,
    UsersModule,
    CodesModule,
    KnowledgeModule,
    VehiclesModule,
    JobsModule,
    EstimatesModule,
    FieldReportsModule,
    InsightsModule,
    ImportsModule,
    SeedModule,
  ],
  controllers: [HealthController],
  providers: [
    { provide: APP_GUARD, useClass: ThrottlerGuard },
    { provide: APP_GUARD, useClass: JwtAuthGuard },
    { provide: APP_GUARD, useClass: RolesGuard },
    { provide: APP_FILTER, useClass: AllExceptionsFilter },
  ],
})
export class AppModule {}
