// The antenna engine in the browser, off the main thread: the plan screen posts
// `{ id, request }` and gets the plan back, or the engine's `path: message` problems.
import { plan } from "@/lib/antenna/plan";
import { EngineInputError } from "@/lib/antenna/problems";
import type { PlanWorkerReply } from "./use-plan-worker";

self.onmessage = (event: MessageEvent<{ id: number; request: unknown }>) => {
  const { id, request } = event.data;
  let reply: PlanWorkerReply;
  try {
    reply = { id, ok: true, result: plan(request) };
  } catch (error) {
    reply = error instanceof EngineInputError ? { id, ok: false, problems: error.problems } : { id, ok: false, problems: [`request: ${error instanceof Error ? error.message : String(error)}`] };
  }
  self.postMessage(reply);
};
