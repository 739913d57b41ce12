import { Module } from '@nestjs/common';
import { QualityScheduler } from './quality-jobs.js';

/** Queues quality checks; imported by the modules whose changes call for one (no other dependencies, so no cycles). */
@Module({ providers: [QualityScheduler], exports: [QualityScheduler] })
export class QualitySchedulerModule {}
