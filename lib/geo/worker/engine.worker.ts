/**
 * The engine's Web Worker: wires `handleEngineMessage` to the worker's message port.
 * Create it with `new Worker(new URL("./engine.worker.ts", import.meta.url), { type: "module" })`.
 */
import { handleEngineMessage } from "./handle-message";

const scope = self as unknown as DedicatedWorkerGlobalScope;

scope.onmessage = (event: MessageEvent<unknown>) => {
  const { response, transfer } = handleEngineMessage(event.data);
  scope.postMessage(response, transfer);
};
