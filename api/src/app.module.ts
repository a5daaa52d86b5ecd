import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { AuditModule } from './audit/audit.module';
import { AttachmentsModule } from './attachments/attachments.module';
import { AuthModule } from './auth/auth.module';
import { CaseArchivesModule } from './case-archives/case-archives.module';
import { CasesModule } from './cases/cases.module';
import type { AppConfig } from './config/app-config';
import { APP_CONFIG, AppConfigModule } from './config/config.module';
import { buildDataSourceOptions } from './database/data-source-options';
import { EscalationsModule } from './escalations/escalations.module';
import { EventsModule } from './events/events.module';
import { HealthModule } from './health/health.module';
import { IdentifyModule } from './identify/identify.module';
import { LibraryModule } from './library/library.module';
import { ReportsModule } from './reports/reports.module';
import { ReviewModule } from './review/review.module';
import { SymmetryModule } from './symmetry/symmetry.module';
import { SyncModule } from './sync/sync.module';
import { UsersModule } from './users/users.module';

/** The whole API. */
@Module({
  imports: [
    AppConfigModule,
    TypeOrmModule.forRootAsync({
      inject: [APP_CONFIG],
      useFactory: (config: AppConfig) => ({
        ...buildDataSourceOptions(config.database),
        // Fail fast at start when the database is unreachable, rather than retrying for half a minute.
        retryAttempts: 3,
        retryDelay: 1000,
      }),
    }),
    UsersModule,
    AuthModule,
    HealthModule,
    CasesModule,
    CaseArchivesModule,
    SyncModule,
    EscalationsModule,
    EventsModule,
    AttachmentsModule,
    LibraryModule,
    IdentifyModule,
    SymmetryModule,
    AuditModule,
    ReviewModule,
    ReportsModule,
  ],
})
export class AppModule {}
