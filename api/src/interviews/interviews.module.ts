import { Module } from '@nestjs/common';
import { ProjectsModule } from '../projects/projects.module.js';
import { QualitySchedulerModule } from '../quality/quality-scheduler.module.js';
import { QuotasModule } from '../quotas/quotas.module.js';
import { InterviewsController } from './interviews.controller.js';
import { ExportService } from './export.service.js';
import { FlagCountsService } from './flag-counts.service.js';
import { SyncService } from './sync.service.js';
import { VoidService } from './void.service.js';

@Module({ imports: [ProjectsModule, QuotasModule, QualitySchedulerModule], controllers: [InterviewsController], providers: [SyncService, ExportService, FlagCountsService, VoidService] })
export class InterviewsModule {}
