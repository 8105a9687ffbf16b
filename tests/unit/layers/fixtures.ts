import { readFileSync } from "node:fs";
import path from "node:path";

/** A file from tests/fixtures/layers, as the bytes an upload would carry. */
export function fixtureBytes(name: string): Uint8Array {
  return new Uint8Array(readFileSync(path.join("tests/fixtures/layers", name)));
}

/** A fixture decoded as UTF-8 (a byte-order mark stays in the text, as a string upload would carry it). */
export function fixtureText(name: string): string {
  return readFileSync(path.join("tests/fixtures/layers", name), "utf8");
}
