// A device as the PWA's sync behaves: an outbox of interviews that leaves only when the
// server acknowledges each one (accepted or duplicate), in batches of up to 1,000; any other
// outcome (no answer, a dropped connection, 5xx, 503 with Retry-After) keeps the batch and
// retries it; a 401 refreshes the sign-in first.

export interface Interview {
  id: string;
  disposition: 'complete' | 'refusal';
  categories?: Record<string, string>;
  headlineAnswer?: boolean;
  startedAt: string;
  endedAt: string;
}

/** What every device saw, per interview id and per kind of failed request. */
export class Ledger {
  readonly accepted = new Map<string, number>();
  readonly duplicate = new Map<string, number>();
  readonly rejected = new Map<string, string>();
  readonly failures: Record<string, number> = {};
  requests = 0;
  inFlight = 0;

  note(map: Map<string, number>, id: string): void {
    map.set(id, (map.get(id) ?? 0) + 1);
  }

  fail(kind: string): void {
    this.failures[kind] = (this.failures[kind] ?? 0) + 1;
  }

  acknowledged(): number {
    return new Set([...this.accepted.keys(), ...this.duplicate.keys()]).size;
  }
}

const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));
const BATCH = 1000;

export class Device {
  private readonly outbox = new Map<string, Interview>();
  private access = '';
  private refresh = '';

  constructor(
    private readonly base: string,
    private readonly email: string,
    private readonly password: string,
    private readonly projectId: string,
    interviews: Interview[],
    private readonly ledger: Ledger,
  ) {
    for (const interview of interviews) this.outbox.set(interview.id, interview);
    this.initial = this.outbox.size;
  }

  readonly initial: number;

  get waiting(): number {
    return this.outbox.size;
  }

  async run(deadline: number): Promise<void> {
    while (this.outbox.size > 0 && Date.now() < deadline) {
      if (!this.access && !(await this.signIn())) continue;
      const batch = [...this.outbox.values()].slice(0, BATCH);
      const wait = await this.send(batch);
      if (wait > 0) await sleep(wait + Math.random() * 200);
    }
  }

  /** Sends one batch; answers how long to wait before the next try (0: go on at once). */
  private async send(batch: Interview[]): Promise<number> {
    const ledger = this.ledger;
    ledger.requests++;
    ledger.inFlight++;
    let res: Response;
    let body: { results?: { id: string; status: string; reason?: string }[] } = {};
    try {
      res = await fetch(`${this.base}/api/projects/${this.projectId}/interviews/sync`, {
        method: 'POST',
        headers: { 'Content-Type': 'application/json', Authorization: `Bearer ${this.access}` },
        body: JSON.stringify({ interviews: batch }),
        signal: AbortSignal.timeout(60_000),
      });
      body = await res.json();
    } catch {
      ledger.fail('no answer (connection refused or dropped)');
      return 300;
    } finally {
      ledger.inFlight--;
    }
    if (res.status === 401) {
      ledger.fail('401 (sign-in refreshed)');
      await this.refreshSignIn();
      return 0;
    }
    if (res.status !== 200 || !Array.isArray(body.results)) {
      ledger.fail(`${res.status}`);
      return res.status === 503 ? Number(res.headers.get('retry-after') ?? 1) * 1000 : 500;
    }
    for (const result of body.results) {
      if (result.status === 'accepted') ledger.note(ledger.accepted, result.id);
      else if (result.status === 'duplicate') ledger.note(ledger.duplicate, result.id);
      else ledger.rejected.set(result.id, result.reason ?? 'rejected');
      // Accepted, duplicate and rejected all leave the outbox; a rejection is reported.
      this.outbox.delete(result.id);
    }
    return 0;
  }

  private async signIn(): Promise<boolean> {
    const { status, tokens } = await this.post('/api/auth/login', { email: this.email, password: this.password });
    if (!tokens) {
      this.ledger.fail(`sign-in answered ${status}`);
      await sleep(500);
      return false;
    }
    [this.access, this.refresh] = [tokens.accessToken, tokens.refreshToken];
    return true;
  }

  /** Only a refusal (401) ends the session; an outage keeps it for the next try. */
  private async refreshSignIn(): Promise<void> {
    const { status, tokens } = await this.post('/api/auth/refresh', { refreshToken: this.refresh });
    if (tokens) [this.access, this.refresh] = [tokens.accessToken, tokens.refreshToken];
    else if (status === 401) this.access = '';
    else await sleep(500);
  }

  private async post(path: string, body: object): Promise<{ status: number; tokens?: { accessToken: string; refreshToken: string } }> {
    try {
      const res = await fetch(`${this.base}${path}`, {
        method: 'POST',
        headers: { 'Content-Type': 'application/json' },
        body: JSON.stringify(body),
        signal: AbortSignal.timeout(30_000),
      });
      return res.ok ? { status: res.status, tokens: await res.json() } : { status: res.status };
    } catch {
      return { status: 0 };
    }
  }
}
