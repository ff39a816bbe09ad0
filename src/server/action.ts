// The one wrapper for server actions. Forms validate in the browser with the same zod schema
// (react-hook-form), then call the action with the typed values; the action checks again,
// because a server action is a public endpoint.
import { z } from "zod";
import { PublicError } from "@/server/errors";
import type { Actor } from "@/server/policy";
import { getViewer } from "@/server/session";

export interface ActionResult<T = undefined> {
  ok: boolean;
  /** A message for the whole form (success or failure). */
  message?: string;
  /** Messages per field, shown beside the field. */
  fieldErrors?: Record<string, string>;
  /** What the action gives back; on a failure, the facts the PublicError carries (its `details`, such as a booked item's next free time). */
  data?: T;
}

export function fieldErrorsOf(error: z.ZodError): Record<string, string> {
  const errors: Record<string, string> = {};
  for (const issue of error.issues) {
    const key = issue.path.map(String).join(".") || "form";
    errors[key] ??= issue.message;
  }
  return errors;
}

/** A thrown error as an action's answer: a PublicError's message (on its field, if it names one) and its details as `data`. */
export function failure<T = never>(error: unknown): ActionResult<T> {
  if (error instanceof PublicError) {
    const answer: ActionResult<T> = error.field ? { ok: false, fieldErrors: { [error.field]: error.message } } : { ok: false, message: error.message };
    // The details are the error's facts rather than the action's own result; the form reading them knows their shape.
    if (error.details) answer.data = error.details as T;
    return answer;
  }
  console.error(error);
  return { ok: false, message: "Something went wrong on our side. Try again." };
}

/** An action for signed-in people: session, schema, then the service (which asks the policy). */
export function signedInAction<S extends z.ZodType, T = undefined>(
  schema: S,
  run: (actor: Actor, input: z.infer<S>) => Promise<ActionResult<T> | void>,
) {
  return async (input: z.input<S>): Promise<ActionResult<T>> => {
    const viewer = await getViewer();
    if (!viewer) return { ok: false, message: "Your session has ended. Sign in again." };
    return runParsed(schema, input, (parsed) => run(viewer.actor, parsed));
  };
}

/** An action open to signed-out visitors (joining, accepting an invitation). */
export function publicAction<S extends z.ZodType, T = undefined>(schema: S, run: (input: z.infer<S>) => Promise<ActionResult<T> | void>) {
  return async (input: z.input<S>): Promise<ActionResult<T>> => runParsed(schema, input, run);
}

async function runParsed<S extends z.ZodType, T>(
  schema: S,
  input: unknown,
  run: (parsed: z.infer<S>) => Promise<ActionResult<T> | void>,
): Promise<ActionResult<T>> {
  const parsed = schema.safeParse(input);
  if (!parsed.success) return { ok: false, fieldErrors: fieldErrorsOf(parsed.error) };
  try {
    return (await run(parsed.data)) ?? { ok: true };
  } catch (error) {
    return failure(error);
  }
}
