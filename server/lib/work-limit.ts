import { HttpError } from '@/server/lib/http-error';

/** A 503 that tells the client when to come back (the error handler sets Retry-After from it). */
export class BusyError extends HttpError {
  constructor(message: string, public readonly retryAfterSeconds: number) {
    super(503, 'busy', message);
  }
}

export interface WorkLimitOptions {
  /** Jobs running at once. */
  concurrency: number;
  /** Jobs allowed to wait for a turn; one more is refused with a BusyError at once. */
  queue: number;
  retryAfterSeconds: number;
  /** Said to the client when refused. */
  busyMessage: string;
}

/**
 * Bounds expensive work (password hashing, image decoding, CSV parsing): at most `concurrency` jobs run, at most
 * `queue` wait, and anything beyond is refused with 503 + Retry-After instead of piling up in memory and CPU.
 */
export class WorkLimit {
  private running = 0;
  private readonly waiting: (() => void)[] = [];

  constructor(private readonly opts: WorkLimitOptions) {}

  get stats() {
    return { running: this.running, waiting: this.waiting.length };
  }

  async run<T>(job: () => Promise<T>): Promise<T> {
    if (this.running >= this.opts.concurrency) {
      if (this.waiting.length >= this.opts.queue) throw new BusyError(this.opts.busyMessage, this.opts.retryAfterSeconds);
      await new Promise<void>((resolve) => this.waiting.push(resolve));
    } else {
      this.running += 1;
    }
    try {
      return await job();
    } finally {
      // Hand the slot straight to the next waiter, so the running count never dips and lets a newcomer jump the queue.
      const next = this.waiting.shift();
      if (next) next();
      else this.running -= 1;
    }
  }
}
