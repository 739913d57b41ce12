// Reads yield to writes. At most a few GET requests are worked on at once per API process;
// more wait their turn in arrival order, costing nothing while they wait. Without this,
// twenty screens polling back to back take most of the process's turns and a device's
// sync, whose statements hold the project's lock, waits behind them at every step.
import type { RequestHandler } from 'express';

export function readBulkhead(limit: number): RequestHandler {
  let active = 0;
  const waiting: (() => void)[] = [];
  const startNext = () => {
    while (active < limit && waiting.length) {
      active += 1;
      waiting.shift()!();
    }
  };
  return (req, res, next) => {
    if (req.method !== 'GET' || !req.path.startsWith('/api/')) return next();
    let state: 'waiting' | 'working' | 'done' = 'waiting';
    const start = () => {
      state = 'working';
      next();
    };
    // A client that gives up while waiting leaves the queue; one that is served frees its place.
    const end = () => {
      if (state === 'working') {
        active -= 1;
        startNext();
      } else if (state === 'waiting') {
        const at = waiting.indexOf(start);
        if (at >= 0) waiting.splice(at, 1);
      }
      state = 'done';
    };
    res.on('finish', end);
    res.on('close', end);
    waiting.push(start);
    startNext();
  };
}
