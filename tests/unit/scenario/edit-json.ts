/** Test helpers that edit a parsed JSON document by a path like `stations[1].lon`. */

type JsonValue = null | boolean | number | string | JsonValue[] | { [key: string]: JsonValue };
type Container = JsonValue[] | { [key: string]: JsonValue };

function splitPath(path: string): (string | number)[] {
  return [...path.matchAll(/([^.[\]]+)|\[(\d+)\]/g)].map((m) => (m[2] !== undefined ? Number(m[2]) : m[1]));
}

function parentOf(root: JsonValue, keys: (string | number)[]): Container {
  let node = root as Container;
  for (const key of keys.slice(0, -1)) node = (node as Record<string | number, JsonValue>)[key] as Container;
  return node;
}

/** A deep copy of `doc` with the value at `path` replaced (or added). */
export function withField(doc: unknown, path: string, value: unknown): unknown {
  const copy = structuredClone(doc) as JsonValue;
  const keys = splitPath(path);
  (parentOf(copy, keys) as Record<string | number, unknown>)[keys[keys.length - 1]] = value;
  return copy;
}

/** A deep copy of `doc` without the field at `path`. */
export function withoutField(doc: unknown, path: string): unknown {
  const copy = structuredClone(doc) as JsonValue;
  const keys = splitPath(path);
  delete (parentOf(copy, keys) as Record<string | number, unknown>)[keys[keys.length - 1]];
  return copy;
}

/** Applies several edits in order: `[path, value]` sets, `[path]` deletes. */
export function edited(doc: unknown, ...edits: ([string, unknown] | [string])[]): unknown {
  return edits.reduce((current, edit) => (edit.length === 2 ? withField(current, edit[0], edit[1]) : withoutField(current, edit[0])), doc);
}
