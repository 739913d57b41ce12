import { Module } from '@nestjs/common';
import { ProjectsModule } from '../projects/projects.module.js';
import { InterviewersController } from './interviewers.controller.js';
import { RatesRepository } from './rates.repository.js';
import { RatesService } from './rates.service.js';

@Module({
  imports: [ProjectsModule],
  controllers: [InterviewersController],
  providers: [RatesService, RatesRepository],
})
export class InterviewersModule {}
