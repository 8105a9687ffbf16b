// A worker thread does not inherit the tsx loader of `npm run bench` on Node 20: register it here,
// then load the TypeScript host.
import { register } from "tsx/esm/api";

register();
await import("./worker-host.mts");
