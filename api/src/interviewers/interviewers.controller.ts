import { Controller, Get, Param, ParseUUIDPipe } from '@nestjs/common';
import { ApiBearerAuth, ApiOkResponse, ApiTags } from '@nestjs/swagger';
import { CurrentUser } from '../common/decorators/current-user.decorator.js';
import { Roles } from '../common/decorators/roles.decorator.js';
import type { AuthUser } from '../common/roles.js';
import { ProjectInterviewerRatesResponse } from './dto/rates-response.dto.js';
import { RatesService } from './rates.service.js';

@ApiTags('interviewers')
@ApiBearerAuth()
@Controller('projects/:projectId/interviewers')
@Roles('lead', 'admin', 'supervisor')
export class InterviewersController {
  constructor(private readonly ratesService: RatesService) {}

  /** Each interviewer's contacts, outcome mix, cooperation, refusal and contact rates, durations, flags and back-checks. */
  @Get('rates')
  @ApiOkResponse({ type: ProjectInterviewerRatesResponse })
  rates(@CurrentUser() user: AuthUser, @Param('projectId', ParseUUIDPipe) projectId: string) {
    return this.ratesService.rates(user, projectId);
  }
}
