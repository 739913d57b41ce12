import { Module } from '@nestjs/common';
import { ProjectsModule } from '../projects/projects.module.js';
import { FindingsSummaryService } from './findings-summary.service.js';
import { QualitySchedulerModule } from './quality-scheduler.module.js';
import { QualityController } from './quality.controller.js';
import { QualitySettingsService } from './quality-settings.service.js';
import { QualityChecker } from './quality-worker.js';

/** The quality rules' settings, their job and what they found (issue 11). */
@Module({
  imports: [ProjectsModule, QualitySchedulerModule],
  controllers: [QualityController],
  providers: [QualitySettingsService, FindingsSummaryService, QualityChecker],
  exports: [QualityChecker],
})
export class QualityModule {}
