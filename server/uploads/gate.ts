/**
 * A small counting semaphore: at most `concurrency` uploads are parsed and processed at once
 * (each may hold a file of up to the size limit in memory and a decoder thread); up to
 * `maxWaiting` more wait their turn, and further ones get 503 with Retry-After (ASVS 15.2.2).
 */
import { HttpError } from "../errors";

export class UploadGate {
  private running = 0;
  private readonly waiting: (() => void)[] = [];

  constructor(
    private readonly concurrency: number,
    private readonly maxWaiting: number,
  ) {}

  async acquire(): Promise<() => void> {
    if (this.running >= this.concurrency) {
      if (this.waiting.length >= this.maxWaiting) {
        throw new HttpError(503, "service_unavailable", "The server is busy with other uploads. Try again in a moment.", undefined, { "Retry-After": "5" });
      }
      await new Promise<void>((resolve) => this.waiting.push(resolve));
    } else {
      this.running += 1;
    }
    let released = false;
    return () => {
      if (released) return;
      released = true;
      const next = this.waiting.shift();
      // Hand the slot straight to the next waiter; otherwise free it.
      if (next) next();
      else this.running -= 1;
    };
  }
}
