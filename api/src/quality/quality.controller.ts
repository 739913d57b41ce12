import { Body, Controller, Get, Param, ParseUUIDPipe, Put } from '@nestjs/common';
import { ApiBearerAuth, ApiOkResponse, ApiTags } from '@nestjs/swagger';
import { CurrentUser } from '../common/decorators/current-user.decorator.js';
import { Roles } from '../common/decorators/roles.decorator.js';
import type { AuthUser } from '../common/roles.js';
import { FindingsSummaryResponse } from './dto/findings-summary.dto.js';
import { QualitySettingsDto, QualitySettingsResponse } from './dto/quality-settings.dto.js';
import { FindingsSummaryService } from './findings-summary.service.js';
import { QualitySettingsService } from './quality-settings.service.js';

@ApiTags('quality')
@ApiBearerAuth()
@Controller('projects/:id')
export class QualityController {
  constructor(
    private readonly settings: QualitySettingsService,
    private readonly findings: FindingsSummaryService,
  ) {}

  @Get('quality-settings')
  @Roles('lead', 'admin', 'supervisor')
  @ApiOkResponse({ type: QualitySettingsResponse })
  getSettings(@CurrentUser() user: AuthUser, @Param('id', ParseUUIDPipe) id: string) {
    return this.settings.get(user, id);
  }

  /** Replaces the project's quality rules; the flags are computed again with them. */
  @Put('quality-settings')
  @Roles('lead', 'admin')
  @ApiOkResponse({ type: QualitySettingsResponse })
  putSettings(@CurrentUser() user: AuthUser, @Param('id', ParseUUIDPipe) id: string, @Body() dto: QualitySettingsDto) {
    return this.settings.put(user, id, dto);
  }

  @Get('quality/findings-summary')
  @Roles('lead', 'admin', 'supervisor')
  @ApiOkResponse({ type: FindingsSummaryResponse })
  summary(@CurrentUser() user: AuthUser, @Param('id', ParseUUIDPipe) id: string) {
    return this.findings.summary(user, id);
  }
}
