import { Module } from '@nestjs/common';
import { ProjectsModule } from '../projects/projects.module.js';
import { ReviewController } from './review.controller.js';
import { ReviewDecisionsService } from './review-decisions.service.js';
import { ReviewQueueService } from './review-queue.service.js';
import { ReviewTrailService } from './review-trail.service.js';

@Module({ imports: [ProjectsModule], controllers: [ReviewController], providers: [ReviewQueueService, ReviewDecisionsService, ReviewTrailService] })
export class ReviewModule {}
