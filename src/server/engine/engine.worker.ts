// The antenna engine in a worker thread: answers `{ id, call, request }` with the engine's
// result, or with its `path: message` problems when the input is bad. The engine validates
// the request itself, so the problems are the same as on the command line.
import { parentPort } from "node:worker_threads";
import { evaluate } from "@/lib/antenna/evaluate";
import { plan } from "@/lib/antenna/plan";
import { EngineInputError } from "@/lib/antenna/problems";
import { trim } from "@/lib/antenna/trim";
import type { EngineCall, EngineReply } from "./protocol";

const calls = { plan, evaluate, trim } satisfies Record<EngineCall, (request: unknown) => unknown>;

parentPort!.on("message", ({ id, call, request }: { id: number; call: EngineCall; request: unknown }) => {
  let reply: EngineReply;
  try {
    reply = { id, ok: true, result: calls[call](request) };
  } catch (error) {
    reply =
      error instanceof EngineInputError
        ? { id, ok: false, problems: error.problems }
        : { id, ok: false, error: error instanceof Error ? (error.stack ?? error.message) : String(error) };
  }
  parentPort!.postMessage(reply);
});
