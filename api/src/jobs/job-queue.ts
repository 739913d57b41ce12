// Jobs on a queue kept in PostgreSQL (pg-boss, schema "pgboss" in the app's database): every
// API instance may send and work on them, a job survives a restart until a worker finishes
// it, and a failed job is tried again with growing delays. A plain class, so the command
// line can queue jobs without starting the server.
import PgBoss from 'pg-boss';

export interface QueueDefinition {
  name: string;
  /** Tries after the first (default 5), with delays doubling from retryDelaySeconds. */
  retryLimit?: number;
  retryDelaySeconds?: number;
}

export type JobHandler<T> = (data: T, job: { id: string; name: string }) => Promise<void>;

export class JobQueue {
  private readonly boss: PgBoss;
  private readonly created = new Map<string, Promise<void>>();
  private started: Promise<unknown> | null = null;

  constructor(databaseUrl: string, options: { maintenance?: boolean } = {}) {
    const maintenance = options.maintenance ?? true;
    this.boss = new PgBoss({
      connectionString: databaseUrl,
      max: 3,
      application_name: 'plumbline-jobs',
      // The command line only queues: it leaves upkeep and schedules to the servers.
      supervise: maintenance,
      schedule: maintenance,
    });
    // Errors while polling (e.g. the database restarting) are retried by pg-boss itself.
    this.boss.on('error', () => undefined);
  }

  start(): Promise<unknown> {
    this.started ??= this.boss.start();
    return this.started;
  }

  /** Creates the queue once (idempotent across instances). */
  define(queue: QueueDefinition): Promise<void> {
    let creating = this.created.get(queue.name);
    if (!creating) {
      creating = this.start().then(() =>
        this.boss.createQueue(queue.name, {
          name: queue.name,
          retryLimit: queue.retryLimit ?? 5,
          retryDelay: queue.retryDelaySeconds ?? 30,
          retryBackoff: true,
        }),
      );
      this.created.set(queue.name, creating);
    }
    return creating;
  }

  /** Queues one job; it is in PostgreSQL when the promise resolves. */
  async send<T extends object>(queue: QueueDefinition, data: T, options: { startAfterSeconds?: number } = {}): Promise<string> {
    await this.define(queue);
    const id = await this.boss.send(queue.name, data, options.startAfterSeconds ? { startAfter: options.startAfterSeconds } : {});
    if (!id) throw new Error(`queue ${queue.name} did not take the job`);
    return id;
  }

  /** Works on the queue's jobs one at a time; a handler that throws has its job retried. */
  async work<T extends object>(queue: QueueDefinition, handler: JobHandler<T>, pollingIntervalSeconds = 1): Promise<void> {
    await this.define(queue);
    await this.boss.work<T>(queue.name, { batchSize: 1, pollingIntervalSeconds }, async (jobs) => {
      for (const job of jobs) await handler(job.data, { id: job.id, name: job.name });
    });
  }

  /** Finishes the jobs in hand (up to `timeoutMs`), then closes the connections. */
  async stop(timeoutMs = 10_000): Promise<void> {
    if (!this.started) return;
    await this.started.catch(() => undefined);
    await this.boss.stop({ graceful: true, wait: true, timeout: timeoutMs });
    this.started = null;
  }
}
