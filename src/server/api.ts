// The one wrapper for route handlers: session (401), zod parsing of params, query and body
// (400 with the list of problems), the handler, and typed errors turned into safe answers.
import { NextResponse, type NextRequest } from "next/server";
import type { z } from "zod";
import { formatPath } from "@/lib/antenna/problems";
import { PublicError } from "@/server/errors";
import type { Actor } from "@/server/policy";
import { getViewer } from "@/server/session";

export interface Problem {
  path: string;
  message: string;
}

export function zodProblems(error: z.ZodError): Problem[] {
  return error.issues.map((issue) => ({ path: formatPath(issue.path, ""), message: issue.message }));
}

export const badRequest = (problems: Problem[]) =>
  NextResponse.json({ error: "bad-input", message: problems.map((p) => (p.path ? `${p.path}: ${p.message}` : p.message)).join("; "), problems }, { status: 400 });

interface RouteSpec<P extends z.ZodType, Q extends z.ZodType, B extends z.ZodType> {
  params?: P;
  query?: Q;
  body?: B;
  /** Routes that answer without a session (health, calendar feeds) set this to false. */
  signedIn?: boolean;
}

interface RouteInput<P, Q, B> {
  /** The signed-in person; routes with `signedIn: false` must not read it. */
  actor: Actor;
  params: P;
  query: Q;
  body: B;
  request: NextRequest;
}

type Handler<P, Q, B> = (input: RouteInput<P, Q, B>) => Promise<Response | unknown>;

export function route<P extends z.ZodType = z.ZodUndefined, Q extends z.ZodType = z.ZodUndefined, B extends z.ZodType = z.ZodUndefined>(
  spec: RouteSpec<P, Q, B>,
  handler: Handler<z.infer<P>, z.infer<Q>, z.infer<B>>,
) {
  return async (request: NextRequest, context: { params: Promise<Record<string, string | string[]>> }) => {
    try {
      const viewer = await getViewer();
      if (spec.signedIn !== false && !viewer) {
        return NextResponse.json({ error: "unauthenticated", message: "Sign in first." }, { status: 401 });
      }
      const problems: Problem[] = [];
      const parse = <T extends z.ZodType>(schema: T | undefined, value: unknown, prefix: string) => {
        if (!schema) return undefined;
        const result = schema.safeParse(value);
        if (!result.success) {
          problems.push(...zodProblems(result.error).map((p) => ({ ...p, path: prefix && p.path ? `${prefix}.${p.path}` : p.path || prefix })));
          return undefined;
        }
        return result.data;
      };
      const params = parse(spec.params, await context.params, "");
      const query = parse(spec.query, Object.fromEntries(request.nextUrl.searchParams), "");
      let body: unknown;
      if (spec.body) {
        let raw: unknown;
        try {
          raw = await request.json();
        } catch {
          return badRequest([{ path: "", message: "The request body is not valid JSON." }]);
        }
        body = parse(spec.body, raw, "");
      }
      if (problems.length > 0) return badRequest(problems);
      const result = await handler({ actor: viewer?.actor, params, query, body, request } as RouteInput<z.infer<P>, z.infer<Q>, z.infer<B>>);
      if (result instanceof Response) return result;
      return NextResponse.json(result ?? { ok: true });
    } catch (error) {
      return errorResponse(error);
    }
  };
}

export function errorResponse(error: unknown): Response {
  if (error instanceof PublicError) {
    if (error.code === "bad-input") return badRequest((error.details?.problems as Problem[] | undefined) ?? [{ path: error.field ?? "", message: error.message }]);
    return NextResponse.json({ error: error.code, message: error.message, ...error.details }, { status: error.status });
  }
  console.error(error);
  return NextResponse.json({ error: "internal", message: "Something went wrong on our side. Try again." }, { status: 500 });
}
