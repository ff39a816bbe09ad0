/**
 * Bad input to the antenna engine is reported as a list of problems, each a
 * `path: message` line such as `wires[1].diameterMm: must be greater than 0`,
 * so that the command line, the HTTP routes and the forms all name the field.
 */
import type { z } from "zod";

/** Input the engine refuses; `problems` holds one `path: message` line per fault. */
export class EngineInputError extends Error {
  readonly problems: string[];

  constructor(problems: string[]) {
    super(problems.join("; "));
    this.name = "EngineInputError";
    this.problems = problems;
  }
}

/** A path such as ["wires", 1, "diameterMm"] written as `wires[1].diameterMm`; the empty path is `root`. */
export function formatPath(path: readonly PropertyKey[], root = "request"): string {
  let text = "";
  for (const key of path) {
    if (typeof key === "number") text += `[${key}]`;
    else text += text === "" ? String(key) : `.${String(key)}`;
  }
  return text === "" ? root : text;
}

/** One problem line from a path and a message. */
export function problem(path: readonly PropertyKey[], message: string): string {
  return `${formatPath(path)}: ${message}`;
}

/** zod's issues as `path: message` lines, without zod's generic "Invalid input:" prefix. */
export function zodProblems(error: z.ZodError): string[] {
  return error.issues.map((issue) => problem(issue.path, issue.message.replace(/^Invalid input: /, "")));
}

/** Parse with a zod schema, or throw EngineInputError with every problem found. */
export function parseOrThrow<T>(schema: z.ZodType<T>, input: unknown): T {
  const result = schema.safeParse(input);
  if (!result.success) throw new EngineInputError(zodProblems(result.error));
  return result.data;
}
