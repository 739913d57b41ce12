import { Module } from '@nestjs/common';
import { ProjectsModule } from '../projects/projects.module.js';
import { CellAllocatorModule } from './cell-allocator.js';
import { CellsService } from './cells.service.js';
import { QuotasController } from './quotas.controller.js';
import { TargetsService } from './targets.service.js';

@Module({
  imports: [ProjectsModule, CellAllocatorModule],
  controllers: [QuotasController],
  providers: [TargetsService, CellsService],
  exports: [CellsService],
})
export class QuotasModule {}
