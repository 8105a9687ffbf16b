import type { z } from "zod";
import { errorBodySchema } from "./contracts";

/** An API failure as the browser sees it: the server's message and status. */
export class ApiRequestError extends Error {
  constructor(
    message: string,
    readonly status: number,
  ) {
    super(message);
  }
}

/** Fetches one of Leeway's own API routes, checks the status and validates the JSON it returns. */
export async function fetchJson<S extends z.ZodType>(url: string, schema: S, init?: RequestInit): Promise<z.infer<S>> {
  const response = await fetch(url, { ...init, headers: { accept: "application/json", ...init?.headers } });
  const body: unknown = await response.json().catch(() => undefined);
  if (!response.ok) {
    const parsed = errorBodySchema.safeParse(body);
    throw new ApiRequestError(parsed.success ? parsed.data.error.message : `Request failed (${response.status}).`, response.status);
  }
  return schema.parse(body);
}
