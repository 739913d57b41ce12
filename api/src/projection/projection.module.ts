import { Module } from '@nestjs/common';
import { ProjectsModule } from '../projects/projects.module.js';
import { ProjectionController } from './projection.controller.js';
import { ProjectionService } from './projection.service.js';

@Module({ imports: [ProjectsModule], controllers: [ProjectionController], providers: [ProjectionService] })
export class ProjectionModule {}
