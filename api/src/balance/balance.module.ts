import { Module } from '@nestjs/common';
import { ProjectsModule } from '../projects/projects.module.js';
import { BalanceController } from './balance.controller.js';
import { BalanceService } from './balance.service.js';

@Module({ imports: [ProjectsModule], controllers: [BalanceController], providers: [BalanceService], exports: [BalanceService] })
export class BalanceModule {}
