import { DynamicModule, Module } from '@nestjs/common';
import { APP_FILTER, APP_GUARD, APP_INTERCEPTOR } from '@nestjs/core';
import { ServeStaticModule } from '@nestjs/serve-static';
import { LoggerModule } from 'nestjs-pino';
import type { DestinationStream } from 'pino';
import { existsSync } from 'node:fs';
import { join } from 'node:path';
import { AccountsModule } from './accounts/accounts.module.js';
import { AssignmentsModule } from './assignments/assignments.module.js';
import { AuthModule } from './auth/auth.module.js';
import { BackchecksModule } from './backchecks/backchecks.module.js';
import { BalanceModule } from './balance/balance.module.js';
import { BenchmarksModule } from './benchmarks/benchmarks.module.js';
import { AllExceptionsFilter } from './common/filters/http-exception.filter.js';
import { JwtAuthGuard } from './common/guards/jwt-auth.guard.js';
import { RolesGuard } from './common/guards/roles.guard.js';
import { ContentTypeInterceptor } from './common/interceptors/content-type.interceptor.js';
import { EtagInterceptor } from './common/interceptors/etag.interceptor.js';
import type { AppConfig } from './config/config.js';
import { ConfigModule } from './config/config.module.js';
import { DatabaseModule } from './database/database.module.js';
import { HealthModule } from './health/health.module.js';
import { InterviewersModule } from './interviewers/interviewers.module.js';
import { InterviewsModule } from './interviews/interviews.module.js';
import { JobsModule } from './jobs/jobs.module.js';
import { NextInterviewsModule } from './next-interviews/next-interviews.module.js';
import { OrganisationsModule } from './organisations/organisations.module.js';
import { ProjectionModule } from './projection/projection.module.js';
import { ProjectsModule } from './projects/projects.module.js';
import { QualityModule } from './quality/quality.module.js';
import { QuotasModule } from './quotas/quotas.module.js';
import { ReviewModule } from './review/review.module.js';
import { UsersModule } from './users/users.module.js';

@Module({})
export class AppModule {
  static forRoot(config: AppConfig, logStream?: DestinationStream): DynamicModule {
    return {
      module: AppModule,
      imports: [
        ConfigModule.forRoot(config),
        LoggerModule.forRoot({
          pinoHttp: [{
            level: config.logLevel,
            // Tokens and passwords never reach the log: bodies are not logged and
            // credentials in headers are removed.
            redact: ['req.headers.authorization', 'req.headers.cookie', 'res.headers["set-cookie"]'],
            autoLogging: { ignore: (req) => !req.url?.startsWith('/api/') },
            serializers: {
              req: (req: { id: unknown; method: string; url: string }) => ({ id: req.id, method: req.method, url: req.url }),
              res: (res: { statusCode: number }) => ({ statusCode: res.statusCode }),
            },
          }, logStream ?? process.stdout],
        }),
        DatabaseModule,
        HealthModule,
        AuthModule,
        UsersModule,
        ProjectsModule,
        ProjectionModule,
        QuotasModule,
        NextInterviewsModule,
        AssignmentsModule,
        InterviewsModule,
        InterviewersModule,
        BalanceModule,
        BenchmarksModule,
        QualityModule,
        BackchecksModule,
        ReviewModule,
        JobsModule,
        AccountsModule,
        OrganisationsModule,
        ...pwaModules(config),
      ],
      providers: [
        { provide: APP_GUARD, useClass: JwtAuthGuard },
        { provide: APP_GUARD, useClass: RolesGuard },
        { provide: APP_FILTER, useClass: AllExceptionsFilter },
        { provide: APP_INTERCEPTOR, useClass: ContentTypeInterceptor },
        { provide: APP_INTERCEPTOR, useClass: EtagInterceptor },
      ],
    };
  }
}

/**
 * The page for every other path (the PWA's own routes), so a reload on /interviewer/outbox
 * works; the built files themselves are served, compressed, by common/middleware/pwa-files.
 */
function pwaModules(config: AppConfig): DynamicModule[] {
  if (!config.pwaDist || !existsSync(join(config.pwaDist, 'index.html'))) return [];
  return [
    ServeStaticModule.forRoot({
      rootPath: config.pwaDist,
      exclude: ['/api/{*path}'],
      serveStaticOptions: {
        index: false,
        // Hashed build assets never change; the page and the service worker are re-checked.
        setHeaders: (res: { setHeader(name: string, value: string): void }, path: string) => {
          res.setHeader('Cache-Control', /[\\/]assets[\\/]/.test(path) ? 'public, max-age=31536000, immutable' : 'no-cache');
        },
      },
    }),
  ];
}
