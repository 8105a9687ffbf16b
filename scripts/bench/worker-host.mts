/**
 * Runs the map workspace's engine worker module (lib/geo/worker/engine.worker.ts) unchanged in a
 * Node worker thread: `self` becomes a small stand-in that forwards messages to and from the
 * parent port, as a browser's DedicatedWorkerGlobalScope would.
 */
import { parentPort } from "node:worker_threads";

if (!parentPort) throw new Error("worker-host.ts runs inside a worker thread");
const port = parentPort;

const scope: { onmessage: ((event: { data: unknown }) => void) | null; postMessage: (message: unknown, transfer?: ArrayBuffer[]) => void } = {
  onmessage: null,
  postMessage: (message, transfer) => port.postMessage(message, transfer ?? []),
};
(globalThis as unknown as { self: typeof scope }).self = scope;
port.on("message", (data: unknown) => scope.onmessage?.({ data }));

void import("@/lib/geo/worker/engine.worker").then(() => port.postMessage({ ready: true }));
