"use client";

import { useCallback, useEffect, useRef, useState } from "react";
import type { PlanResult } from "@/lib/antenna/plan";

export type PlanWorkerReply = { id: number; ok: true; result: PlanResult } | { id: number; ok: false; problems: string[] };

export interface PlanComputation {
  result: PlanResult | null;
  /** The engine's `path: message` lines for the latest request, if it refused it. */
  problems: string[];
  computing: boolean;
  /** Milliseconds the latest plan took in the worker, as the page saw it. */
  elapsedMs: number | null;
}

/**
 * Runs plans in a Web Worker with the same engine library as the server. Only the latest
 * request's answer is shown: answers to requests sent before it are dropped.
 */
export function usePlanWorker() {
  const worker = useRef<Worker | null>(null);
  const latest = useRef<{ id: number; sentAt: number; request?: unknown }>({ id: 0, sentAt: 0 });
  const [state, setState] = useState<PlanComputation>({ result: null, problems: [], computing: false, elapsedMs: null });

  useEffect(() => {
    const instance = new Worker(new URL("./plan.worker.ts", import.meta.url));
    instance.onmessage = (event: MessageEvent<PlanWorkerReply>) => {
      const reply = event.data;
      if (reply.id !== latest.current.id) return;
      const elapsedMs = performance.now() - latest.current.sentAt;
      setState((previous) =>
        reply.ok
          ? { result: reply.result, problems: [], computing: false, elapsedMs }
          : { result: previous.result, problems: reply.problems, computing: false, elapsedMs: null },
      );
    };
    worker.current = instance;
    // A request made before the worker existed goes out now.
    if (latest.current.id > 0) instance.postMessage({ id: latest.current.id, request: latest.current.request });
    return () => {
      instance.terminate();
      worker.current = null;
    };
  }, []);

  const compute = useCallback((request: unknown) => {
    latest.current = { id: latest.current.id + 1, sentAt: performance.now(), request };
    setState((previous) => ({ ...previous, computing: true }));
    worker.current?.postMessage({ id: latest.current.id, request });
  }, []);

  return { ...state, compute };
}
