import { BadRequestException, Inject, Injectable } from '@nestjs/common';
import type { Knex } from 'knex';
import { KNEX } from '../database/database.constants.js';

/**
 * Time zone names as the database knows them. Field days are worked out by PostgreSQL
 * (`AT TIME ZONE`), whose list can differ from Node's: Node still accepts US/Pacific-New,
 * which the tz database dropped in 2020. The list is read once and kept for the process.
 */
@Injectable()
export class TimeZones {
  private names: Promise<Set<string>> | null = null;

  constructor(@Inject(KNEX) private readonly db: Knex) {}

  /** Refuses a zone the database cannot use, naming the field; undefined passes (left out). */
  async check(zone: string | undefined): Promise<void> {
    if (zone === undefined) return;
    this.names ??= this.db
      .select('name')
      .from('pg_timezone_names')
      .then((rows: { name: string }[]) => new Set(rows.map((r) => r.name)));
    let known: Set<string>;
    try {
      known = await this.names;
    } catch (error) {
      this.names = null; // try again next time (the database may have been out of reach)
      throw error;
    }
    if (!known.has(zone)) {
      const message = `timeZone ${zone} is not a time zone the database knows; use a name such as Europe/London`;
      throw new BadRequestException({ message, fields: [{ field: 'timeZone', message }] });
    }
  }
}
