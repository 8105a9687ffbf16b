/**
 * Leeway's one error type for the API: a small set of kinds, each mapped to an HTTP status.
 * The message is safe to show to the person who made the request; the original error, if any,
 * stays in `cause` for the server log.
 */
export const ERROR_STATUS = {
  invalid: 400,
  unauthenticated: 401,
  forbidden: 403,
  "not-found": 404,
  conflict: 409,
  "too-large": 413,
  "rate-limited": 429,
  internal: 500,
} as const;

export type ErrorKind = keyof typeof ERROR_STATUS;

export interface FieldIssue {
  /** JSON path (`source.depthKm`, `stations[2].lon`) or CSV position (`row 14, column lat`). */
  path: string;
  message: string;
}

export class LeewayError extends Error {
  readonly kind: ErrorKind;
  readonly issues: FieldIssue[];

  constructor(kind: ErrorKind, message: string, options: { issues?: FieldIssue[]; cause?: unknown } = {}) {
    super(message, { cause: options.cause });
    this.kind = kind;
    this.issues = options.issues ?? [];
  }

  get status(): number {
    return ERROR_STATUS[this.kind];
  }
}

/** The JSON body every failed API request returns. */
export interface ErrorBody {
  error: { kind: ErrorKind; message: string; issues?: FieldIssue[] };
}

export function toErrorBody(error: LeewayError): ErrorBody {
  return {
    error: {
      kind: error.kind,
      message: error.message,
      ...(error.issues.length ? { issues: error.issues } : {}),
    },
  };
}
