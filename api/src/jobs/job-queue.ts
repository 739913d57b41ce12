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
  /** pg-boss queue policy; "short" keeps at most one waiting job per singleton key. */
  policy?: 'standard' | 'short' | 'singleton' | 'stately';
}

export type JobHandler<T> = (data: T, job: { id: string; name: string }) => Promise<void>;

const sleep = (ms: number) => new Promise<void>((resolve) => setTimeout(resolve, ms).unref());

export class JobQueue {
  private readonly created = new Map<string, Promise<void>>();
  private ready: Promise<PgBoss> | null = null;
  private boss: PgBoss | null = null;
  private closed = false;

  constructor(
    private readonly databaseUrl: string,
    private readonly options: { maintenance?: boolean } = {},
  ) {}

  /**
   * Connects (creating pg-boss's schema when missing) in the background; while the database
   * cannot be reached it tries again with growing pauses, so the API still starts during an outage.
   */
  start(): Promise<PgBoss> {
    this.ready ??= this.connect();
    return this.ready;
  }

  /** Creates the queue once (idempotent across instances). */
  define(queue: QueueDefinition): Promise<void> {
    let creating = this.created.get(queue.name);
    if (!creating) {
      const create = (boss: PgBoss) =>
        boss.createQueue(queue.name, {
          name: queue.name,
          retryLimit: queue.retryLimit ?? 5,
          retryDelay: queue.retryDelaySeconds ?? 30,
          retryBackoff: true,
          ...(queue.policy ? { policy: queue.policy } : {}),
        });
      // Two queues created at once on a new database can deadlock in PostgreSQL (one of them
      // is refused): the refused one is tried again.
      creating = this.start().then(async (boss) => {
        for (let attempt = 0; ; attempt++) {
          try {
            return await create(boss);
          } catch (error) {
            if (attempt >= 4 || (error as { code?: string }).code !== '40P01') throw error;
            await sleep(100 * 2 ** attempt);
          }
        }
      });
      creating.catch(() => this.created.delete(queue.name));
      this.created.set(queue.name, creating);
    }
    return creating;
  }

  /** Queues one job; it is in PostgreSQL when the promise resolves. */
  async send<T extends object>(queue: QueueDefinition, data: T, options: { startAfterSeconds?: number } = {}): Promise<string> {
    await this.define(queue);
    const boss = await this.start();
    const id = await boss.send(queue.name, data, options.startAfterSeconds ? { startAfter: options.startAfterSeconds } : {});
    if (!id) throw new Error(`queue ${queue.name} did not take the job`);
    return id;
  }

  /**
   * Queues one job under a singleton key; on a queue whose policy coalesces (such as "short")
   * it resolves null when a job with that key is already waiting.
   */
  async sendOnce<T extends object>(queue: QueueDefinition, data: T, singletonKey: string): Promise<string | null> {
    await this.define(queue);
    const boss = await this.start();
    return boss.send(queue.name, data, { singletonKey });
  }

  /**
   * Sends a job to the queue on a cron schedule (UTC). pg-boss keeps one schedule per queue
   * name, so every instance may set it; the servers' upkeep sends the jobs.
   */
  async schedule<T extends object>(queue: QueueDefinition, cron: string, data: T): Promise<void> {
    await this.define(queue);
    const boss = await this.start();
    await boss.schedule(queue.name, cron, data);
  }

  /** Works on the queue's jobs one at a time; a handler that throws has its job retried. */
  async work<T extends object>(queue: QueueDefinition, handler: JobHandler<T>, pollingIntervalSeconds = 1): Promise<void> {
    await this.define(queue);
    const boss = await this.start();
    await boss.work<T>(queue.name, { batchSize: 1, pollingIntervalSeconds }, async (jobs) => {
      for (const job of jobs) await handler(job.data, { id: job.id, name: job.name });
    });
  }

  /** Finishes the jobs in hand (up to `timeoutMs`), then closes the connections. */
  async stop(timeoutMs = 10_000): Promise<void> {
    this.closed = true;
    const boss = this.boss;
    this.boss = null;
    if (boss) await boss.stop({ graceful: true, wait: true, timeout: timeoutMs });
  }

  private async connect(): Promise<PgBoss> {
    for (let attempt = 0; ; attempt++) {
      const maintenance = this.options.maintenance ?? true;
      const boss = new PgBoss({
        connectionString: this.databaseUrl,
        max: 3,
        application_name: 'plumbline-jobs',
        // The command line only queues: it leaves upkeep and schedules to the servers.
        supervise: maintenance,
        schedule: maintenance,
      });
      // Errors while polling (e.g. the database restarting) are retried by pg-boss itself.
      boss.on('error', () => undefined);
      try {
        await boss.start();
        if (this.closed) {
          await boss.stop({ graceful: false, wait: true });
          throw new Error('the job queue was stopped while connecting');
        }
        this.boss = boss;
        return boss;
      } catch (error) {
        await boss.stop({ graceful: false, wait: false }).catch(() => undefined);
        if (this.closed) throw error;
        await sleep(Math.min(30_000, 500 * 2 ** attempt));
      }
    }
  }
}
