import { Module } from '@nestjs/common';
import { QualitySchedulerModule } from '../quality/quality-scheduler.module.js';
import { CellAllocatorModule } from '../quotas/cell-allocator.js';
import { ProjectAccess } from './project-access.service.js';
import { ProjectArchive } from './project-archive.service.js';
import { ProjectsController } from './projects.controller.js';
import { ProjectsService } from './projects.service.js';
import { TimeZones } from './time-zones.js';

@Module({
  imports: [CellAllocatorModule, QualitySchedulerModule],
  controllers: [ProjectsController],
  providers: [ProjectsService, ProjectAccess, ProjectArchive, TimeZones],
  exports: [ProjectsService, ProjectAccess],
})
export class ProjectsModule {}
