import { Body, Controller, Get, Param, ParseUUIDPipe, Put } from '@nestjs/common';
import { ApiBearerAuth, ApiOkResponse, ApiTags } from '@nestjs/swagger';
import { CurrentUser } from '../common/decorators/current-user.decorator.js';
import { Roles } from '../common/decorators/roles.decorator.js';
import type { AuthUser } from '../common/roles.js';
import { ProjectAccess } from '../projects/project-access.service.js';
import { BalanceService } from './balance.service.js';
import { BalanceResponse } from './dto/balance-response.dto.js';
import { MergeRetiredDto } from './dto/merge-retired.dto.js';

@ApiTags('balance')
@ApiBearerAuth()
@Controller('projects/:projectId/balance')
export class BalanceController {
  constructor(
    private readonly access: ProjectAccess,
    private readonly balanceService: BalanceService,
  ) {}

  /** Read-only for clients of the project; interviewers do not see it. */
  @Get()
  @Roles('lead', 'admin', 'supervisor', 'client')
  @ApiOkResponse({ type: BalanceResponse })
  async balance(@CurrentUser() user: AuthUser, @Param('projectId', ParseUUIDPipe) projectId: string) {
    return this.balanceService.balance(await this.access.find(user, projectId));
  }

  /** What weighting does with a retired category's interviews: counted as a current category of the same variable, or (null) left out. */
  @Put('retired/:categoryId')
  @Roles('lead', 'admin')
  @ApiOkResponse({ type: BalanceResponse })
  async mergeRetired(
    @CurrentUser() user: AuthUser,
    @Param('projectId', ParseUUIDPipe) projectId: string,
    @Param('categoryId', ParseUUIDPipe) categoryId: string,
    @Body() dto: MergeRetiredDto,
  ) {
    const project = await this.access.find(user, projectId);
    await this.balanceService.mergeRetired(projectId, categoryId, dto.mergedInto);
    return this.balanceService.balance(project);
  }
}
