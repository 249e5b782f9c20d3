import { Module } from '@nestjs/common';
import { ConfigModule, ConfigService } from '@nestjs/config';
import { ServeStaticModule } from '@nestjs/serve-static';
import { TypeOrmModule } from '@nestjs/typeorm';
import { AircraftTypesModule } from './aircraft-types/aircraft-types.module.js';
import { AircraftModule } from './aircraft/aircraft.module.js';
import { AuditModule } from './audit/audit.module.js';
import { AuthModule } from './auth/auth.module.js';
import { CyclesModule } from './cycles/cycles.module.js';
import { ENV_FILE_PATHS, type Environment, validateEnvironment } from './config/environment.js';
import { dataSourceOptions } from './database/data-source.js';
import { GatewayModule } from './gateway/gateway.module.js';
import { HealthModule } from './health/health.module.js';
import { ImportsModule } from './imports/imports.module.js';
import { LineupModule } from './lineup/lineup.module.js';
import { DeckModule } from './deck/deck.module.js';
import { MailModule } from './mail/mail.module.js';
import { PasswordLinksModule } from './password-links/password-links.module.js';
import { ReportsModule } from './reports/reports.module.js';
import { ShipsModule } from './ships/ships.module.js';
import { SquadronsModule } from './squadrons/squadrons.module.js';
import { UsersModule } from './users/users.module.js';
import { webAppBuilt, webAppHeaders, webDist } from './web-app/web-app.js';

@Module({
  imports: [
    ConfigModule.forRoot({ isGlobal: true, envFilePath: ENV_FILE_PATHS, validate: validateEnvironment }),
    TypeOrmModule.forRootAsync({
      inject: [ConfigService],
      useFactory: (config: ConfigService<Environment, true>) => ({
        ...dataSourceOptions({
          DB_HOST: config.get('DB_HOST'),
          DB_PORT: config.get('DB_PORT'),
          DB_NAME: config.get('DB_NAME'),
          DB_USER: config.get('DB_USER'),
          DB_PASSWORD: config.get('DB_PASSWORD'),
          DB_REPLICA_HOST: config.get('DB_REPLICA_HOST'),
          DB_REPLICA_PORT: config.get('DB_REPLICA_PORT'),
        }),
        retryAttempts: 3,
      }),
    }),
    ...(webAppBuilt()
      ? [
          ServeStaticModule.forRoot({
            rootPath: webDist,
            exclude: ['/api/{*path}'],
            serveStaticOptions: { setHeaders: webAppHeaders },
          }),
        ]
      : []),
    HealthModule,
    AuditModule,
    AuthModule,
    UsersModule,
    ShipsModule,
    SquadronsModule,
    AircraftTypesModule,
    AircraftModule,
    CyclesModule,
    LineupModule,
    DeckModule,
    GatewayModule,
    MailModule,
    PasswordLinksModule,
    ImportsModule,
    ReportsModule,
  ],
})
export class AppModule {}
