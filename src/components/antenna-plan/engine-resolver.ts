// react-hook-form checks the plan form with the engine's own zod schema: the form's values
// become the engine's plan request, and each problem goes back to the field it names (the
// request's paths are the form's, except a custom ground's, which the form keeps apart).
import type { FieldErrors, Resolver } from "react-hook-form";
import { planRequestSchema, type PlanRequestInput } from "@/lib/antenna/plan-schema";
import type { PlanFormValues } from "@/lib/plan-screen/form-values";

export interface PlanProblem {
  path: string;
  message: string;
}

/** The engine's problems for a request, with paths written as the form's field names. */
export function requestProblems(request: PlanRequestInput): PlanProblem[] {
  const parsed = planRequestSchema.safeParse(request);
  if (parsed.success) return [];
  return parsed.error.issues.map((issue) => {
    const path = issue.path.map(String);
    if (path[0] === "ground" && path.length > 1) path[0] = "customGround";
    return { path: path.join("."), message: issue.message.replace(/^Invalid input: /, "") };
  });
}

export function engineResolver(toRequest: (values: PlanFormValues) => PlanRequestInput): Resolver<PlanFormValues> {
  return async (values) => {
    const problems = requestProblems(toRequest(values));
    if (problems.length === 0) return { values, errors: {} };
    const errors: Record<string, unknown> = {};
    for (const { path, message } of problems) {
      const keys = path ? path.split(".") : ["root"];
      let node = errors;
      keys.slice(0, -1).forEach((key) => {
        node[key] ??= {};
        node = node[key] as Record<string, unknown>;
      });
      node[keys[keys.length - 1]] ??= { type: "engine", message };
    }
    return { values: {}, errors: errors as FieldErrors<PlanFormValues> };
  };
}
