// The antenna engine on the server, off the event loop: `runPlan`, `runEvaluate` and `runTrim` send the
// request to a pool of worker threads, so a sweep of a few hundred milliseconds never stalls
// other requests, and several requests run side by side on several cores.
//
// How the worker file is bundled: Turbopack (Next 16.2 and later, in `next dev` and
// `next build`) recognises exactly the form `new Worker(new URL("./file.ts", import.meta.url))`
// with Node's `worker_threads` Worker, and emits the file with everything it imports as a
// separate worker entry chunk under .next/server/chunks; `next start` then runs that chunk.
// The URL must stay written inline in the `new Worker(...)` call, and the options an object
// literal, for Turbopack to see it (with `cond ? undefined : {...}` as options it does not).
// A pool package that takes a file name (piscina, tinypool) would get a path Turbopack never
// bundles, so Guyline keeps its own small pool (pool.ts).
// Outside Next (vitest, tsx scripts) the same URL points at the TypeScript source, which
// Node 20 runs only through tsx's require hook; Next sets NEXT_RUNTIME, nothing else does.
import { availableParallelism } from "node:os";
import { Worker } from "node:worker_threads";
import type { EvaluateResponse } from "@/lib/antenna/evaluate";
import type { PlanResult } from "@/lib/antenna/plan";
import { EngineInputError } from "@/lib/antenna/problems";
import type { TrimResult } from "@/lib/antenna/trim";
import type { Problem } from "@/server/api";
import { PublicError } from "@/server/errors";
import { PoolBusyError, PoolTimeLimitError, WorkerPool } from "./pool";
import type { EngineCall, EngineReply } from "./protocol";

/** A plan takes well under a second; the contract's largest evaluate (2000 segments) can take hours. */
export const ENGINE_TIME_LIMIT_MS = 30_000;
/** Requests that may wait for a free worker before the engine answers "busy". */
const MAX_QUEUED = 32;

function startEngineWorker(): Worker {
  return new Worker(new URL("./engine.worker.ts", import.meta.url), { execArgv: process.env.NEXT_RUNTIME ? undefined : ["--require", "tsx/cjs"] });
}

// One pool per process, kept on globalThis so that every route bundle and hot reload share it.
const globalForEngine = globalThis as unknown as { guylineEnginePool?: WorkerPool };

function enginePool(): WorkerPool {
  globalForEngine.guylineEnginePool ??= new WorkerPool({
    // Up to one worker per core (at most 4): the main thread only passes messages meanwhile.
    size: Math.max(1, Math.min(4, availableParallelism())),
    start: startEngineWorker,
    timeLimitMs: ENGINE_TIME_LIMIT_MS,
    maxQueued: MAX_QUEUED,
  });
  return globalForEngine.guylineEnginePool;
}

async function runInWorker(call: EngineCall, request: unknown): Promise<unknown> {
  let reply: EngineReply;
  try {
    reply = (await enginePool().run({ call, request })) as EngineReply;
  } catch (error) {
    if (error instanceof PoolTimeLimitError) {
      throw new EngineInputError([
        `request: the engine did not finish within ${ENGINE_TIME_LIMIT_MS / 1000} s; use fewer segments or fewer frequencies`,
      ]);
    }
    if (error instanceof PoolBusyError) throw new PublicError("rate-limited", "The antenna engine is busy. Try again in a few seconds.");
    throw error;
  }
  if (reply.ok) return reply.result;
  if ("problems" in reply) throw new EngineInputError(reply.problems);
  throw new Error(`The antenna engine failed: ${reply.error}`);
}

/** The engine's plan for a request (validated in the worker); bad input rejects with EngineInputError. */
export function runPlan(request: unknown): Promise<PlanResult> {
  return runInWorker("plan", request) as Promise<PlanResult>;
}

/** The contract's evaluate call; bad input rejects with EngineInputError. */
export function runEvaluate(request: unknown): Promise<EvaluateResponse> {
  return runInWorker("evaluate", request) as Promise<EvaluateResponse>;
}

/** Trim advice from a measured resonance (re-solves the geometry); bad input rejects with EngineInputError. */
export function runTrim(request: unknown): Promise<TrimResult> {
  return runInWorker("trim", request) as Promise<TrimResult>;
}

/** The engine's `path: message` lines as the HTTP API's problems. */
export function engineProblems(error: EngineInputError): Problem[] {
  return error.problems.map((line) => {
    const split = line.indexOf(": ");
    return split < 0 ? { path: "", message: line } : { path: line.slice(0, split), message: line.slice(split + 2) };
  });
}
