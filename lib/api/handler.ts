import "server-only";
import type { z } from "zod";
import { LeewayError, toErrorBody } from "@/lib/errors";
import { toFieldIssues } from "./zod-issues";

type Handler<C> = (request: Request, context: C) => Promise<Response>;

/**
 * Wraps a route handler so that every failure becomes Leeway's JSON error body with its status;
 * unexpected errors are logged and answered with a generic 500.
 */
export function route<C>(handler: Handler<C>): Handler<C> {
  return async (request, context) => {
    try {
      return await handler(request, context);
    } catch (error) {
      if (error instanceof LeewayError) {
        return Response.json(toErrorBody(error), { status: error.status });
      }
      console.error(error);
      const internal = new LeewayError("internal", "Something went wrong on the server; nothing was changed.");
      return Response.json(toErrorBody(internal), { status: 500 });
    }
  };
}

/** Reads a JSON body and validates it; the message names the field that is wrong. */
export async function parseJsonBody<S extends z.ZodType>(request: Request, schema: S): Promise<z.infer<S>> {
  const text = await request.text();
  let json: unknown;
  try {
    json = JSON.parse(text);
  } catch {
    throw new LeewayError("invalid", "The request body is not valid JSON.");
  }
  return parseWith(schema, json, "The request body is not valid");
}

/** Validates route params or search params with a schema. */
export function parseWith<S extends z.ZodType>(schema: S, value: unknown, what: string): z.infer<S> {
  const parsed = schema.safeParse(value);
  if (!parsed.success) {
    const issues = toFieldIssues(parsed.error);
    const first = issues[0];
    throw new LeewayError("invalid", `${what}: ${first.path}: ${first.message}`, { issues });
  }
  return parsed.data;
}
