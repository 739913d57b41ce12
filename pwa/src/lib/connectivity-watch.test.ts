import { afterEach, describe, expect, it, vi } from 'vitest';
import { installFakeApi, json } from '../test/fake-api';
import { PROBE_MS, probeDelay, startConnectivityWatch } from './connectivity-watch';
import { readReachability } from './reachability';
import { FIRST_RETRY_MS, MAX_RETRY_MS, retryDelay } from '../sync/sync-scheduler';

afterEach(() => {
  vi.useRealTimers();
});

describe('retry pacing', () => {
  it('backs off exponentially with jitter: first retry within 5 s, never over 60 s', () => {
    // Bounds follow from the rule (first retry within about 5 s, capped at 60 s);
    // "equal jitter" keeps each delay between half and all of its ceiling (common practice).
    const lowest = () => 0;
    const highest = () => 0.999999;
    expect(retryDelay(1, highest)).toBeLessThanOrEqual(FIRST_RETRY_MS);
    expect(retryDelay(1, lowest)).toBeGreaterThanOrEqual(FIRST_RETRY_MS / 2);
    expect(retryDelay(2, highest)).toBeGreaterThan(retryDelay(1, highest));
    for (let failures = 1; failures <= 30; failures++) {
      expect(retryDelay(failures, highest)).toBeLessThanOrEqual(MAX_RETRY_MS);
    }
    expect(retryDelay(30, lowest)).toBeGreaterThanOrEqual(MAX_RETRY_MS / 2);
  });

  it('probes at least every 10 s, jittered so a team’s phones do not probe in step', () => {
    const delays = Array.from({ length: 200 }, () => probeDelay());
    expect(Math.max(...delays)).toBeLessThanOrEqual(PROBE_MS);
    expect(Math.min(...delays)).toBeGreaterThanOrEqual(0.7 * PROBE_MS);
    expect(new Set(delays.map((d) => Math.round(d))).size).toBeGreaterThan(50);
  });
});

describe('connectivity watch', () => {
  it('learns from a real request that the office is out of reach, and that it is back, with no browser event', async () => {
    vi.useFakeTimers({ toFake: ['setTimeout', 'clearTimeout', 'Date'] });
    const api = installFakeApi();
    api.on('GET', '/api/health', () => json({ status: 'ok' }));
    api.setNetwork('down');
    expect(navigator.onLine).toBe(true); // the browser believes it is online throughout

    const stop = startConnectivityWatch();
    await vi.waitFor(() => expect(readReachability().reach).toBe('unreachable'));
    const { since, nextTryAt } = readReachability();
    expect(Date.now() - since!).toBeLessThan(1000);
    expect(nextTryAt! - Date.now()).toBeLessThanOrEqual(PROBE_MS);

    // A long outage: the probes keep coming at most 10 s apart.
    const probesBefore = api.calls.length;
    await vi.advanceTimersByTimeAsync(90_000);
    expect(readReachability().reach).toBe('unreachable');
    expect(readReachability().since).toBe(since);

    api.setNetwork('up');
    await vi.advanceTimersByTimeAsync(PROBE_MS);
    expect(readReachability().reach).toBe('reachable');
    expect(readReachability().nextTryAt).toBeNull();
    expect(api.calls.length - probesBefore).toBe(1); // calls are logged only while the network is up
    stop();
  });
});
