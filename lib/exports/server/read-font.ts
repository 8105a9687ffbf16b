import "server-only";
import { readFile } from "node:fs/promises";
import path from "node:path";

/** A font file's bytes from the repository's fonts/ folder (shipped with the app). */
export async function readFontFile(file: string): Promise<Uint8Array> {
  return new Uint8Array(await readFile(path.join(process.cwd(), "fonts", file)));
}
