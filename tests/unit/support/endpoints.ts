// Finds every route handler and every server action in the source tree, so the role × action test
// can insist that each one has a row in its matrix.
import { readdirSync, readFileSync } from "node:fs";
import path from "node:path";

const ROOT = path.resolve(__dirname, "../../..");
const HTTP_METHODS = ["GET", "HEAD", "POST", "PUT", "PATCH", "DELETE", "OPTIONS"] as const;
export type HttpMethod = (typeof HTTP_METHODS)[number];

function sourceFiles(dir: string): string[] {
  return (readdirSync(path.join(ROOT, dir), { recursive: true }) as string[])
    .filter((file) => /\.(ts|tsx)$/.test(file) && !file.endsWith(".d.ts"))
    .map((file) => path.join(dir, file).split(path.sep).join("/"))
    .sort();
}

/** `app/api/scenarios/[scenarioId]/route.ts` → `/api/scenarios/[scenarioId]` (route groups dropped). */
export function routePathOf(file: string): string {
  const segments = file.replace(/^app\//, "").replace(/\/?route\.ts$/, "").split("/");
  return `/${segments.filter((segment) => segment && !/^\(.*\)$/.test(segment)).join("/")}`;
}

/** Strips leading comments and blank lines, to read a file's directive prologue. */
function prologue(source: string): string {
  return source.replace(/^(\s+|\/\/[^\n]*\n|\/\*[\s\S]*?\*\/)*/, "");
}

const USE_SERVER = /^["']use server["'];?/;

export interface Endpoint {
  /** The matrix key: `POST /api/…` or `app/…/actions.ts#actionName`. */
  key: string;
  file: string;
  exportName: string;
  kind: "route" | "action";
}

/** Imports every route.ts and "use server" file and lists what they export. */
export async function discoverEndpoints(): Promise<Endpoint[]> {
  const endpoints: Endpoint[] = [];
  for (const file of sourceFiles("app").filter((file) => /(^|\/)route\.ts$/.test(file))) {
    const loaded = (await import(path.join(ROOT, file))) as Record<string, unknown>;
    for (const method of HTTP_METHODS) {
      if (typeof loaded[method] === "function") endpoints.push({ key: `${method} ${routePathOf(file)}`, file, exportName: method, kind: "route" });
    }
  }
  for (const file of serverActionFiles()) {
    const loaded = (await import(path.join(ROOT, file))) as Record<string, unknown>;
    for (const [name, value] of Object.entries(loaded)) {
      if (typeof value === "function") endpoints.push({ key: `${file}#${name}`, file, exportName: name, kind: "action" });
    }
  }
  return endpoints;
}

/** Files whose first statement is "use server": every export is a server action. */
export function serverActionFiles(): string[] {
  return ["app", "components", "lib"].flatMap(sourceFiles).filter((file) => USE_SERVER.test(prologue(readFileSync(path.join(ROOT, file), "utf8"))));
}

/**
 * "use server" inside a function body makes an action the test cannot reach by name; Leeway keeps
 * actions in "use server" files instead. Returns `file:line` of each such directive.
 */
export function inlineServerActions(): string[] {
  return ["app", "components", "lib"].flatMap(sourceFiles).flatMap((file) => {
    const source = readFileSync(path.join(ROOT, file), "utf8");
    const body = prologue(source);
    const offset = source.length - body.length + (USE_SERVER.test(body) ? body.match(USE_SERVER)![0].length : 0);
    const found: string[] = [];
    const pattern = /["']use server["']/g;
    for (let match = pattern.exec(source); match; match = pattern.exec(source)) {
      if (match.index >= offset) found.push(`${file}:${source.slice(0, match.index).split("\n").length}`);
    }
    return found;
  });
}
