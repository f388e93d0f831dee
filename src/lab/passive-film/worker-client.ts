import type { PassiveFilmParams, PassiveFilmState, SpanningCurveForModel, SpanningModel } from "@shared/sim/passive-film";
import type { WorkerRequest, WorkerResponse } from "./worker-protocol";

type Pending = { resolve: (value: never) => void; reject: (err: Error) => void; onProgress?: (f: number) => void };
type DistributiveOmit<T, K extends keyof T> = T extends unknown ? Omit<T, K> : never;

/** A promise-based client of one simulation worker. Create one per kind of job so jobs do not queue behind each other. */
export class PassiveFilmWorker {
  private worker: Worker;
  private nextId = 1;
  private pending = new Map<number, Pending>();

  constructor() {
    this.worker = new Worker(new URL("./worker.ts", import.meta.url), { type: "module", name: "passive-film" });
    this.worker.onmessage = (event: MessageEvent<WorkerResponse>) => {
      const message = event.data;
      const job = this.pending.get(message.id);
      if (!job) return;
      if (message.kind === "progress") { job.onProgress?.(message.fractionDone); return; }
      this.pending.delete(message.id);
      if (message.kind === "error") job.reject(new Error(message.message));
      else job.resolve(message as never);
    };
    this.worker.onerror = (event) => {
      for (const job of this.pending.values()) job.reject(new Error(event.message || "The simulation worker failed."));
      this.pending.clear();
    };
  }

  private request<T>(message: DistributiveOmit<WorkerRequest, "id">, onProgress?: (f: number) => void): Promise<T> {
    const id = this.nextId++;
    return new Promise<T>((resolve, reject) => {
      this.pending.set(id, { resolve: resolve as (v: never) => void, reject, onProgress });
      this.worker.postMessage({ ...message, id });
    });
  }

  async init(params: PassiveFilmParams): Promise<{ state: PassiveFilmState; computeMs: number }> {
    return this.request({ kind: "init", params });
  }

  async spanning(model: SpanningModel, onProgress: (f: number) => void): Promise<{ result: SpanningCurveForModel; computeMs: number }> {
    return this.request({ kind: "spanning", model, samples: 60, seed: 1 }, onProgress);
  }

  dispose(): void {
    this.worker.terminate();
    for (const job of this.pending.values()) job.reject(new Error("cancelled"));
    this.pending.clear();
  }
}
