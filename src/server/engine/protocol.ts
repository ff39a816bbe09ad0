// The messages between run.ts and engine.worker.ts.
export type EngineCall = "plan" | "evaluate" | "trim";

export type EngineReply =
  | { id: number; ok: true; result: unknown }
  /** Bad input: the engine's `path: message` lines. */
  | { id: number; ok: false; problems: string[] }
  /** Anything else the engine threw (a bug): its stack, for the server log. */
  | { id: number; ok: false; error: string };
