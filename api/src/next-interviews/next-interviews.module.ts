import { Module } from '@nestjs/common';
import { ProjectsModule } from '../projects/projects.module.js';
import { QuotasModule } from '../quotas/quotas.module.js';
import { NextInterviewsController } from './next-interviews.controller.js';
import { NextInterviewsService } from './next-interviews.service.js';

@Module({ imports: [ProjectsModule, QuotasModule], controllers: [NextInterviewsController], providers: [NextInterviewsService] })
export class NextInterviewsModule {}
