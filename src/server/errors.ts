// Errors a user may see. Anything else thrown is logged and answered as a generic failure.

export type PublicErrorCode = "bad-input" | "unauthenticated" | "forbidden" | "not-found" | "conflict" | "rate-limited";

const statusByCode: Record<PublicErrorCode, number> = {
  "bad-input": 400,
  unauthenticated: 401,
  forbidden: 403,
  "not-found": 404,
  conflict: 409,
  "rate-limited": 429,
};

export class PublicError extends Error {
  readonly status: number;
  constructor(
    readonly code: PublicErrorCode,
    message: string,
    /** The form field the message belongs to, when there is one. */
    readonly field?: string,
    /** Extra facts for the client, such as the next free time of a booked item. */
    readonly details?: Record<string, unknown>,
  ) {
    super(message);
    this.status = statusByCode[code];
  }
}

export const notFound = (what: string) => new PublicError("not-found", `${what} was not found.`);
export const forbidden = (message = "Your role does not allow this.") => new PublicError("forbidden", message);
export const badInput = (field: string, message: string) => new PublicError("bad-input", message, field);
/** Several fields' problems at once: a route answers them all, a form shows the first on its field. */
export const badInputs = (problems: [{ path: string; message: string }, ...{ path: string; message: string }[]]) =>
  new PublicError("bad-input", problems[0].message, problems[0].path, { problems });
export const conflict = (message: string, details?: Record<string, unknown>) =>
  new PublicError("conflict", message, undefined, details);

/** PostgreSQL error codes Guyline turns into user messages (constraints that guard the rules). */
export const pgErrorCodes = {
  uniqueViolation: "23505",
  foreignKeyViolation: "23503",
  checkViolation: "23514",
  exclusionViolation: "23P01",
  serializationFailure: "40001",
} as const;

export function pgErrorCode(error: unknown): string | undefined {
  // Drizzle wraps driver errors; the PostgreSQL code sits on the error or its cause.
  let current: unknown = error;
  for (let depth = 0; depth < 3 && current; depth++) {
    const code = (current as { code?: unknown }).code;
    if (typeof code === "string" && /^[0-9A-Z]{5}$/.test(code)) return code;
    current = (current as { cause?: unknown }).cause;
  }
  return undefined;
}

export function pgConstraint(error: unknown): string | undefined {
  let current: unknown = error;
  for (let depth = 0; depth < 3 && current; depth++) {
    const constraint = (current as { constraint?: unknown }).constraint;
    if (typeof constraint === "string") return constraint;
    current = (current as { cause?: unknown }).cause;
  }
  return undefined;
}
