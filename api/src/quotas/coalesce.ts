/**
 * Shares one computation among callers that ask for the same key at the same time.
 * A caller that arrives while a computation runs waits for the next one, which starts
 * when the running one ends and serves every caller that queued meanwhile: so each caller
 * gets figures read after it asked, and a key never has more than one computation running
 * and one waiting. Twenty supervisors polling one board cost the database about one
 * board read at a time instead of twenty. In memory, per API instance; it keeps nothing
 * once a computation has ended.
 */
export class Coalescer<T> {
  private readonly running = new Map<string, Promise<T>>();
  private readonly waiting = new Map<string, Promise<T>>();

  run(key: string, compute: () => Promise<T>): Promise<T> {
    const waiting = this.waiting.get(key);
    if (waiting) return waiting;
    const running = this.running.get(key);
    if (!running) return this.start(key, compute);
    const next = running
      .catch(() => undefined)
      .then(() => {
        this.waiting.delete(key);
        return this.start(key, compute);
      });
    this.waiting.set(key, next);
    return next;
  }

  private start(key: string, compute: () => Promise<T>): Promise<T> {
    const promise: Promise<T> = compute().finally(() => {
      if (this.running.get(key) === promise) this.running.delete(key);
    });
    this.running.set(key, promise);
    return promise;
  }
}
