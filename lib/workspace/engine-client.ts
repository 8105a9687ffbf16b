/**
 * The map workspace's side of the engine worker (lib/geo/worker). The worker computes one request
 * at a time; while it is busy, each lane keeps only its newest request, so a fast drag never
 * builds a queue: the page shows the latest finished preview and the worker moves straight on to
 * the newest position. A lane's superseded request resolves to `null`.
 */
import type { EngineRequest, EngineResponse } from "@/lib/geo/worker/handle-message";

/** What the client needs of a Worker (a real one in the browser, a fake in tests). */
export interface EngineWorkerPort {
  postMessage(message: unknown): void;
  onmessage: ((event: MessageEvent<unknown>) => void) | null;
  terminate(): void;
}

/** Independent request streams: a newer request replaces an older one only in its own lane. */
export type EngineLane = "preview" | "full" | "sites" | "site-card";

/** A request without its id (the client numbers them). */
export type EngineJob = EngineRequest extends infer R ? (R extends { id: number } ? Omit<R, "id"> : never) : never;

interface Pending {
  lane: EngineLane;
  job: EngineJob;
  resolve: (response: EngineResponse | null) => void;
}

/** Order in which waiting lanes are served: the full grid after a release goes before later previews. */
const LANE_PRIORITY: EngineLane[] = ["full", "site-card", "sites", "preview"];

export class EngineClient {
  private nextId = 1;
  private inFlight: (Pending & { id: number }) | null = null;
  private readonly waiting = new Map<EngineLane, Pending>();

  constructor(private readonly port: EngineWorkerPort) {
    port.onmessage = (event) => this.receive(event.data as EngineResponse);
  }

  /** Queues a job in its lane, replacing (and resolving with null) any job still waiting there. */
  request(lane: EngineLane, job: EngineJob): Promise<EngineResponse | null> {
    return new Promise((resolve) => {
      this.waiting.get(lane)?.resolve(null);
      this.waiting.set(lane, { lane, job, resolve });
      this.pump();
    });
  }

  /** Drops every waiting job of a lane (e.g. previews once the full grid is asked for). */
  cancel(lane: EngineLane): void {
    this.waiting.get(lane)?.resolve(null);
    this.waiting.delete(lane);
  }

  /** True while the worker is computing. */
  get busy(): boolean {
    return this.inFlight !== null;
  }

  dispose(): void {
    this.port.terminate();
    for (const pending of this.waiting.values()) pending.resolve(null);
    this.waiting.clear();
    this.inFlight?.resolve(null);
    this.inFlight = null;
  }

  private pump(): void {
    if (this.inFlight) return;
    const lane = LANE_PRIORITY.find((l) => this.waiting.has(l));
    if (!lane) return;
    const pending = this.waiting.get(lane)!;
    this.waiting.delete(lane);
    const id = this.nextId++;
    this.inFlight = { ...pending, id };
    this.port.postMessage({ ...pending.job, id });
  }

  private receive(response: EngineResponse): void {
    const current = this.inFlight;
    // A message the worker could not read comes back with id null: it can only be the one in flight.
    if (!current || (response.id !== null && response.id !== current.id)) return;
    this.inFlight = null;
    current.resolve(response);
    this.pump();
  }
}

/** Starts the engine worker module in the browser. */
export function startEngineWorker(): EngineClient {
  const worker = new Worker(new URL("../geo/worker/engine.worker.ts", import.meta.url), { type: "module", name: "leeway-engine" });
  return new EngineClient(worker);
}
