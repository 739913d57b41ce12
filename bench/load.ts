// One autocannon run against the API on loopback, with latency percentiles taken from
// every response (autocannon's own histogram rounds to whole milliseconds per bucket).
import autocannon from 'autocannon';

export interface LoadFigures {
  connections: number;
  seconds: number;
  requests: number;
  requestsPerSecond: number;
  p50ms: number;
  p95ms: number;
  p99ms: number;
  errors: number;
}

export interface LoadSpec {
  url: string;
  token: string;
  connections: number;
  seconds: number;
  method?: 'GET' | 'POST';
  /** A fresh JSON body for every request (sync batches must not repeat ids). */
  body?: () => unknown;
}

function percentile(sorted: number[], p: number): number {
  return sorted[Math.min(sorted.length - 1, Math.ceil((p / 100) * sorted.length) - 1)] as number;
}

export async function load(spec: LoadSpec): Promise<LoadFigures> {
  const latencies: number[] = [];
  let errors = 0;
  const headers = { Authorization: `Bearer ${spec.token}`, 'Content-Type': 'application/json' };
  const result = await new Promise<autocannon.Result>((done, fail) => {
    const instance = autocannon(
      {
        url: spec.url,
        connections: spec.connections,
        duration: spec.seconds,
        timeout: 60,
        requests: [
          {
            method: spec.method ?? 'GET',
            headers,
            ...(spec.body ? { setupRequest: (req: autocannon.Request) => ({ ...req, body: JSON.stringify(spec.body!()) }) } : {}),
          },
        ],
      },
      (error, r) => (error ? fail(error) : done(r)),
    );
    instance.on('response', (_client, status, _bytes, ms) => {
      if (status !== 200 && status !== 201) errors += 1;
      latencies.push(ms);
    });
  });
  latencies.sort((a, b) => a - b);
  return {
    connections: spec.connections,
    seconds: spec.seconds,
    requests: result.requests.total,
    requestsPerSecond: Number((result.requests.total / spec.seconds).toFixed(1)),
    p50ms: Number(percentile(latencies, 50).toFixed(1)),
    p95ms: Number(percentile(latencies, 95).toFixed(1)),
    p99ms: Number(percentile(latencies, 99).toFixed(1)),
    errors: errors + result.errors + result.timeouts,
  };
}
