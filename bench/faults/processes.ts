// The processes the fault suite breaks: the built API (api/dist/main.js, on its own port and
// database) and this checkout's PostgreSQL cluster, stopped and started through scripts/lib.sh.
import { execFile, spawn, type ChildProcess } from 'node:child_process';
import { join } from 'node:path';
import { promisify } from 'node:util';

export const root = join(import.meta.dirname, '..', '..');

/** Runs functions of scripts/lib.sh (without blocking the devices) and returns the last line printed. */
export async function lib(command: string): Promise<string> {
  const { stdout } = await promisify(execFile)('bash', ['-c', `source scripts/lib.sh && ${command}`], { cwd: root, encoding: 'utf8', timeout: 300_000 });
  return stdout.trim().split('\n').at(-1) ?? '';
}

export const stopDatabase = () => lib('stop_postgres');
export const startDatabase = () => lib('ensure_postgres_running');

const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

export class ApiProcess {
  private child: ChildProcess | null = null;
  readonly base: string;

  constructor(
    private readonly port: number,
    private readonly databaseUrl: string,
  ) {
    this.base = `http://127.0.0.1:${port}`;
  }

  async start(): Promise<void> {
    this.child = spawn(process.execPath, [join(root, 'api/dist/main.js')], {
      env: {
        ...process.env,
        DATABASE_URL: this.databaseUrl,
        PORT: String(this.port),
        HOST: '127.0.0.1',
        JWT_SECRET: 'fault-suite-secret-0123456789abcdefghijkl',
        LOG_LEVEL: 'error',
        // The benchmark sends no mail; the setting is required, nothing listens there.
        SMTP_URL: 'smtp://127.0.0.1:1025',
      },
      stdio: ['ignore', 'ignore', 'inherit'],
    });
    for (let i = 0; i < 150; i++) {
      if (await fetch(`${this.base}/api/health`).then((r) => r.ok, () => false)) return;
      await sleep(100);
    }
    throw new Error('the API did not answer /api/health within 15 s');
  }

  /** SIGKILL: no shutdown hooks, open transactions die with their connections. */
  async kill(): Promise<void> {
    const child = this.child;
    if (!child || child.exitCode !== null) return;
    const exited = new Promise((r) => child.once('exit', r));
    child.kill('SIGKILL');
    await exited;
    this.child = null;
  }

  async stop(): Promise<void> {
    const child = this.child;
    if (!child || child.exitCode !== null) return;
    const exited = new Promise((r) => child.once('exit', r));
    child.kill('SIGTERM');
    await exited;
  }
}
