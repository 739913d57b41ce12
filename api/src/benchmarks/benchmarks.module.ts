import { Module } from '@nestjs/common';
import { BalanceModule } from '../balance/balance.module.js';
import { ProjectsModule } from '../projects/projects.module.js';
import { BenchmarksController } from './benchmarks.controller.js';
import { BenchmarksService } from './benchmarks.service.js';
import { ReconciliationService } from './reconciliation.service.js';

@Module({ imports: [ProjectsModule, BalanceModule], controllers: [BenchmarksController], providers: [BenchmarksService, ReconciliationService] })
export class BenchmarksModule {}
