import { describe, expect, it } from "vitest";
import { handleEngineMessage } from "@/lib/geo/worker/handle-message";
import { EngineClient, type EngineWorkerPort } from "@/lib/workspace/engine-client";

/** A worker that holds each message until the test lets it answer, through the real message handler. */
class HeldWorker implements EngineWorkerPort {
  onmessage: ((event: MessageEvent<unknown>) => void) | null = null;
  readonly received: { id: number; kind: string; cellKm?: number }[] = [];
  terminated = false;
  postMessage(message: unknown): void {
    this.received.push(message as { id: number; kind: string; cellKm?: number });
  }
  /** Answers the oldest unanswered message. */
  answer(): void {
    const message = this.received[this.answered++];
    this.onmessage?.({ data: handleEngineMessage(message).response } as MessageEvent<unknown>);
  }
  answered = 0;
  terminate(): void {
    this.terminated = true;
  }
}

const SCENARIO = {
  version: 1,
  source: { lon: -126.2, lat: -46.9, depthKm: 10, mw: 6.5, faultType: "crustal" },
  stations: [
    { id: "A", lon: -126.1, lat: -46.9 },
    { id: "B", lon: -126.3, lat: -46.8 },
  ],
  vs30: 400,
  area: { bbox: [-126.6, -47.2, -125.8, -46.6], cellKm: 5 },
};

const grid = (cellKm: number) => ({ kind: "grid" as const, scenario: SCENARIO, cellKm, contours: false });

describe("EngineClient: one job at a time, only the newest waiting job per lane", () => {
  it("sends the first job at once and, of those queued behind it, only the newest", async () => {
    const worker = new HeldWorker();
    const client = new EngineClient(worker);
    const first = client.request("preview", grid(5));
    const superseded = [client.request("preview", grid(4)), client.request("preview", grid(3))];
    const newest = client.request("preview", grid(2));
    expect(worker.received.map((m) => m.cellKm)).toEqual([5]);

    worker.answer();
    expect((await first)?.ok).toBe(true);
    expect(await Promise.all(superseded)).toEqual([null, null]);
    expect(worker.received.map((m) => m.cellKm)).toEqual([5, 2]);
    worker.answer();
    expect((await newest)?.kind).toBe("grid");
  });

  it("serves a waiting full grid before waiting previews, and lanes do not replace each other", async () => {
    const worker = new HeldWorker();
    const client = new EngineClient(worker);
    client.request("preview", grid(5));
    const preview = client.request("preview", grid(4));
    const full = client.request("full", grid(3));
    worker.answer();
    expect(worker.received.map((m) => m.cellKm)).toEqual([5, 3]);
    worker.answer();
    expect((await full)?.kind).toBe("grid");
    expect(worker.received.map((m) => m.cellKm)).toEqual([5, 3, 4]);
    worker.answer();
    expect((await preview)?.kind).toBe("grid");
  });

  it("passes the worker's issues back for a scenario that does not parse, and carries on", async () => {
    const worker = new HeldWorker();
    const client = new EngineClient(worker);
    const bad = client.request("sites", { kind: "sites", scenario: { ...SCENARIO, vs30: Number.NaN }, sites: [] });
    worker.answer();
    const response = await bad;
    expect(response).toMatchObject({ ok: false, kind: "error" });
    expect(response && !response.ok && response.issues[0].path).toBe("vs30");
    const next = client.request("preview", grid(5));
    worker.answer();
    expect((await next)?.ok).toBe(true);
  });
});
