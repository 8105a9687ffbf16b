/**
 * What every Leeway server action returns, so forms (`useActionState`) and the role tests read one
 * shape. `status` uses HTTP's numbers: 200 done, 400 invalid input, 401 not signed in, 403 role not
 * allowed, 404 missing, 409 conflicting state, 429 too many attempts.
 */
export interface ActionResult {
  ok: boolean;
  status: number;
  message: string;
  /** Field name → message, shown next to the field. */
  fieldErrors?: Record<string, string>;
}

/** The state a form starts in, before its first submission. */
export const IDLE: ActionResult | null = null;
