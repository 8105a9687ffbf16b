import { readFileSync } from "node:fs";
import path from "node:path";
import { expect } from "vitest";
import { LayerFileError } from "@/lib/layers/layer-file-error";

/** A file from tests/fixtures/layers, as the bytes an upload would carry. */
export function fixtureBytes(name: string): Uint8Array {
  return new Uint8Array(readFileSync(path.join("tests/fixtures/layers", name)));
}

/** A fixture decoded as UTF-8 (a byte-order mark stays in the text, as a string upload would carry it). */
export function fixtureText(name: string): string {
  return readFileSync(path.join("tests/fixtures/layers", name), "utf8");
}

/** The refusal a reader throws, for checking its message and issues. */
export async function refusal(promise: Promise<unknown>): Promise<LayerFileError> {
  const error = await promise.then(
    () => undefined,
    (e: unknown) => e,
  );
  expect(error).toBeInstanceOf(LayerFileError);
  return error as LayerFileError;
}
