import { LeewayError } from "@/lib/errors";

/**
 * Runs a computation for a page; a version Leeway cannot compute (409: no population layer, a file
 * it cannot read) gives the reason to show instead of an error page. Other failures propagate.
 */
export async function orUnavailable<T>(work: Promise<T>): Promise<{ ok: true; value: T } | { ok: false; reason: string }> {
  try {
    return { ok: true, value: await work };
  } catch (error) {
    if (error instanceof LeewayError && error.kind === "conflict") return { ok: false, reason: error.message };
    throw error;
  }
}
