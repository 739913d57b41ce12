import { Controller, Get, Inject, ServiceUnavailableException } from '@nestjs/common';
import { ApiOkResponse, ApiTags } from '@nestjs/swagger';
import type { Knex } from 'knex';
import { Public } from '../common/decorators/public.decorator.js';
import { KNEX } from '../database/database.constants.js';
import { HealthResponse } from './dto/health-response.dto.js';

@ApiTags('health')
@Controller('health')
export class HealthController {
  constructor(@Inject(KNEX) private readonly db: Knex) {}

  @Public()
  @Get()
  @ApiOkResponse({ type: HealthResponse })
  async check() {
    try {
      await this.db.raw('select 1');
    } catch {
      throw new ServiceUnavailableException('The database is down: the API is running but cannot reach PostgreSQL');
    }
    return { status: 'ok', database: 'up' };
  }
}
