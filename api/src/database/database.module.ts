import { Global, Inject, Module, OnApplicationShutdown } from '@nestjs/common';
import knex, { type Knex } from 'knex';
import pg from 'pg';
import { APP_CONFIG } from '../config/config.constants.js';
import type { AppConfig } from '../config/config.js';
import { KNEX } from './database.constants.js';
import './tables.js';

// DATE columns stay 'YYYY-MM-DD' strings: a field day is a calendar day, not an instant.
pg.types.setTypeParser(pg.types.builtins.DATE, (value: string) => value);

export function createKnex(databaseUrl: string): Knex {
  return knex({ client: 'pg', connection: databaseUrl, pool: { min: 0, max: 10 } });
}

@Global()
@Module({
  providers: [
    { provide: KNEX, inject: [APP_CONFIG], useFactory: (config: AppConfig) => createKnex(config.databaseUrl) },
  ],
  exports: [KNEX],
})
export class DatabaseModule implements OnApplicationShutdown {
  constructor(@Inject(KNEX) private readonly db: Knex) {}

  async onApplicationShutdown(): Promise<void> {
    await this.db.destroy();
  }
}
