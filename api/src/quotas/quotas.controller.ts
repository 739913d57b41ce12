import { Body, Controller, Get, HttpCode, Param, ParseUUIDPipe, Post, Put, UploadedFile, UseInterceptors } from '@nestjs/common';
import { FileInterceptor } from '@nestjs/platform-express';
import { ApiBearerAuth, ApiConsumes, ApiOkResponse, ApiTags } from '@nestjs/swagger';
import { CurrentUser } from '../common/decorators/current-user.decorator.js';
import { Roles } from '../common/decorators/roles.decorator.js';
import type { AuthUser } from '../common/roles.js';
import { ProjectAccess } from '../projects/project-access.service.js';
import { CellsService } from './cells.service.js';
import { SaveTargetsDto } from './dto/targets.dto.js';
import { TargetsService } from './targets.service.js';
import { CellResponse, CellsResponse, QuotaBoardResponse, TargetsPreviewResponse } from './dto/cells-response.dto.js';
import { ParsedTargetsResponse, TargetsResponse } from './dto/targets-response.dto.js';

export const TARGETS_FILE_LIMIT = 256 * 1024;

@ApiTags('quotas')
@ApiBearerAuth()
@Controller('projects/:projectId')
export class QuotasController {
  constructor(
    private readonly access: ProjectAccess,
    private readonly targets: TargetsService,
    private readonly cells: CellsService,
  ) {}

  @Get('targets')
  @ApiOkResponse({ type: TargetsResponse })
  async getTargets(@CurrentUser() user: AuthUser, @Param('projectId', ParseUUIDPipe) projectId: string) {
    await this.access.find(user, projectId);
    return this.targets.get(projectId);
  }

  @Put('targets')
  @Roles('lead', 'admin')
  @ApiOkResponse({ type: TargetsResponse })
  async saveTargets(@CurrentUser() user: AuthUser, @Param('projectId', ParseUUIDPipe) projectId: string, @Body() dto: SaveTargetsDto) {
    await this.access.findEditable(user, projectId);
    return this.targets.save(projectId, dto);
  }

  /** The cells these targets would give, with the interviews already logged in them; saves nothing. */
  @Post('targets/preview')
  @HttpCode(200)
  @Roles('lead', 'admin')
  @ApiOkResponse({ type: TargetsPreviewResponse })
  async previewTargets(@CurrentUser() user: AuthUser, @Param('projectId', ParseUUIDPipe) projectId: string, @Body() dto: SaveTargetsDto) {
    await this.access.find(user, projectId);
    return { cells: await this.targets.preview(projectId, dto) };
  }

  /** Reads an uploaded `variable,category,share` file and returns it for review; saves nothing. */
  @Post('targets/parse')
  @HttpCode(200)
  @Roles('lead', 'admin')
  @ApiConsumes('multipart/form-data')
  @ApiOkResponse({ type: ParsedTargetsResponse })
  // One file and the interlock field: a form of thousands of fields is refused as it arrives.
  @UseInterceptors(FileInterceptor('file', { limits: { fileSize: TARGETS_FILE_LIMIT, files: 1, fields: 4, fieldSize: 4096, parts: 5 } }))
  async parseTargets(
    @CurrentUser() user: AuthUser,
    @Param('projectId', ParseUUIDPipe) projectId: string,
    @UploadedFile() file: { buffer: Buffer; originalname: string } | undefined,
    @Body('interlock') interlock: unknown,
  ) {
    await this.access.find(user, projectId);
    return this.targets.parseUpload(projectId, file, typeof interlock === 'string' ? interlock : '');
  }

  @Get('cells')
  @ApiOkResponse({ type: CellsResponse })
  async getCells(@CurrentUser() user: AuthUser, @Param('projectId', ParseUUIDPipe) projectId: string) {
    await this.access.find(user, projectId);
    return this.cells.cells(projectId);
  }

  @Get('quota-board')
  @Roles('supervisor', 'lead', 'admin')
  @ApiOkResponse({ type: QuotaBoardResponse })
  async board(@CurrentUser() user: AuthUser, @Param('projectId', ParseUUIDPipe) projectId: string) {
    const project = await this.access.find(user, projectId);
    const { cells, interviewers } = await this.cells.board(projectId, project.time_zone);
    return { projectId, targetSize: project.target_size, cells, interviewers, refreshedAt: new Date().toISOString() };
  }

  @Post('cells/:cellId/close')
  @HttpCode(200)
  @Roles('supervisor', 'lead')
  @ApiOkResponse({ type: CellResponse })
  async close(@CurrentUser() user: AuthUser, @Param('projectId', ParseUUIDPipe) projectId: string, @Param('cellId', ParseUUIDPipe) cellId: string) {
    await this.access.findEditable(user, projectId);
    return this.cells.setClosed(user, projectId, cellId, true);
  }

  @Post('cells/:cellId/reopen')
  @HttpCode(200)
  @Roles('supervisor', 'lead')
  @ApiOkResponse({ type: CellResponse })
  async reopen(@CurrentUser() user: AuthUser, @Param('projectId', ParseUUIDPipe) projectId: string, @Param('cellId', ParseUUIDPipe) cellId: string) {
    await this.access.findEditable(user, projectId);
    return this.cells.setClosed(user, projectId, cellId, false);
  }
}
