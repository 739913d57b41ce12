import { Module } from '@nestjs/common';
import { ProjectsModule } from '../projects/projects.module.js';
import { BackchecksController } from './backchecks.controller.js';
import { BackchecksService } from './backchecks.service.js';
import { ReferenceDeletionJob } from './reference-deletion.job.js';

@Module({ imports: [ProjectsModule], controllers: [BackchecksController], providers: [BackchecksService, ReferenceDeletionJob] })
export class BackchecksModule {}
