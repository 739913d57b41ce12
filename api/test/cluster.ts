// Stops and starts this checkout's PostgreSQL cluster through the bootstrap's own functions
// (scripts/lib.sh: pg_ctl as the postgres user, the port from PLUMBLINE_DB_PORT).
import { execFileSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';

const lib = fileURLToPath(new URL('../../scripts/lib.sh', import.meta.url));

function run(fn: string): void {
  execFileSync('bash', ['-c', `source "${lib}" && ${fn}`], { stdio: 'pipe', timeout: 60_000 });
}

export const stopDatabase = () => run('stop_postgres');
export const startDatabase = () => run('ensure_postgres_running');
