import { Body, Controller, HttpCode, Param, ParseUUIDPipe, Post } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { CurrentUser } from '../common/decorators/current-user.decorator.js';
import { Roles } from '../common/decorators/roles.decorator.js';
import type { AuthUser } from '../common/roles.js';
import { SyncBatchDto } from './dto/sync.dto.js';
import { SyncService } from './sync.service.js';

@ApiTags('interviews')
@ApiBearerAuth()
@Controller('projects/:projectId/interviews')
export class InterviewsController {
  constructor(private readonly syncService: SyncService) {}

  /** Idempotent upload: each interview is answered accepted, duplicate or rejected with a reason. */
  @Post('sync')
  @HttpCode(200)
  @Roles('interviewer')
  sync(@CurrentUser() user: AuthUser, @Param('projectId', ParseUUIDPipe) projectId: string, @Body() dto: SyncBatchDto) {
    return this.syncService.sync(user, projectId, dto.interviews);
  }
}
