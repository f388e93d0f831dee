import type { BaseField, CarbideParams, EdgeState, GradeIndexPoint, StoneId } from "@shared/sim/carbides";
import type { CarbideWorkerRequest, CarbideWorkerResponse } from "./worker-protocol";

type DistributiveOmit<T, K extends keyof T> = T extends unknown ? Omit<T, K> : never;

/** Promise-based client of the carbide worker; one instance per kind of job keeps jobs from queueing. */
export class CarbideWorker {
  private worker = new Worker(new URL("./worker.ts", import.meta.url), { type: "module", name: "carbides" });
  private nextId = 1;
  private pending = new Map<number, { resolve: (m: CarbideWorkerResponse) => void; reject: (e: Error) => void }>();

  constructor() {
    this.worker.onmessage = (event: MessageEvent<CarbideWorkerResponse>) => {
      const job = this.pending.get(event.data.id);
      if (!job) return;
      this.pending.delete(event.data.id);
      if (event.data.kind === "error") job.reject(new Error(event.data.message));
      else job.resolve(event.data);
    };
    this.worker.onerror = (event) => {
      for (const job of this.pending.values()) job.reject(new Error(event.message || "The simulation worker failed."));
      this.pending.clear();
    };
  }

  private request(message: DistributiveOmit<CarbideWorkerRequest, "id">): Promise<CarbideWorkerResponse> {
    const id = this.nextId++;
    return new Promise((resolve, reject) => {
      this.pending.set(id, { resolve, reject });
      this.worker.postMessage({ ...message, id });
    });
  }

  async base(params: CarbideParams): Promise<BaseField> {
    const m = await this.request({ kind: "base", params });
    return (m as Extract<CarbideWorkerResponse, { kind: "base" }>).base;
  }

  async scatter(state: "annealed" | "hardened", stone: StoneId): Promise<GradeIndexPoint[]> {
    const m = await this.request({ kind: "scatter", state, stone });
    return (m as Extract<CarbideWorkerResponse, { kind: "scatter" }>).points;
  }

  async restore(edge: EdgeState): Promise<Record<StoneId, number | null>> {
    const m = await this.request({ kind: "restore", edge });
    return (m as Extract<CarbideWorkerResponse, { kind: "restore" }>).strokes;
  }

  dispose(): void {
    this.worker.terminate();
    for (const job of this.pending.values()) job.reject(new Error("cancelled"));
    this.pending.clear();
  }
}
