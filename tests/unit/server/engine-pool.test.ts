// The worker pool under the antenna engine, with small inline workers: replies matched to
// their tasks under concurrency, the size limit, the bounded queue, the time limit and a
// crashing worker replaced by a fresh one.
import { Worker } from "node:worker_threads";
import { afterEach, describe, expect, it } from "vitest";
import { PoolBusyError, PoolTimeLimitError, WorkerPool } from "@/server/engine/pool";

// Answers { id, value: n * 2 } after `delayMs` of busy waiting (a CPU-bound task), with its
// thread id and when it began and ended; exits on `crash`.
const workerCode = `
const { parentPort, threadId } = require("node:worker_threads");
parentPort.on("message", ({ id, n, delayMs = 0, crash }) => {
  if (crash) process.exit(3);
  const began = Date.now();
  while (Date.now() < began + delayMs) {}
  parentPort.postMessage({ id, value: n * 2, threadId, began, ended: Date.now() });
});`;

const pools: WorkerPool[] = [];
function makePool(options: Partial<ConstructorParameters<typeof WorkerPool>[0]> = {}) {
  let started = 0;
  const pool = new WorkerPool({
    size: 2,
    start: () => {
      started += 1;
      return new Worker(workerCode, { eval: true });
    },
    timeLimitMs: 5_000,
    maxQueued: 8,
    ...options,
  });
  pools.push(pool);
  return { pool, started: () => started };
}

afterEach(async () => {
  await Promise.all(pools.splice(0).map((pool) => pool.close()));
});

type Reply = { value: number; threadId: number; began: number; ended: number };

describe("WorkerPool", () => {
  it("answers every one of many concurrent tasks with its own reply, on at most `size` workers", async () => {
    const { pool, started } = makePool();
    const replies = (await Promise.all(Array.from({ length: 10 }, (_, n) => pool.run({ n, delayMs: 20 })))) as Reply[];
    expect(replies.map((reply) => reply.value)).toEqual(Array.from({ length: 10 }, (_, n) => n * 2));
    expect(new Set(replies.map((reply) => reply.threadId)).size).toBe(2);
    expect(started()).toBe(2);
  });

  it("runs two tasks side by side on two workers (their running times overlap)", async () => {
    const { pool } = makePool();
    const [a, b] = (await Promise.all([pool.run({ n: 1, delayMs: 300 }), pool.run({ n: 2, delayMs: 300 })])) as Reply[];
    expect(a.threadId).not.toBe(b.threadId);
    expect(Math.max(a.began, b.began)).toBeLessThan(Math.min(a.ended, b.ended));
  });

  it("refuses a task at once when every worker is busy and the queue is full", async () => {
    const { pool } = makePool({ size: 1, maxQueued: 1 });
    const running = pool.run({ n: 1, delayMs: 200 });
    const queued = pool.run({ n: 2 });
    await expect(pool.run({ n: 3 })).rejects.toBeInstanceOf(PoolBusyError);
    expect(((await running) as Reply).value).toBe(2);
    expect(((await queued) as Reply).value).toBe(4);
  });

  it("ends a task that runs over the time limit and goes on with a fresh worker", async () => {
    const { pool, started } = makePool({ size: 1, timeLimitMs: 1_000 });
    await expect(pool.run({ n: 1, delayMs: 10_000 })).rejects.toBeInstanceOf(PoolTimeLimitError);
    expect(((await pool.run({ n: 5 })) as Reply).value).toBe(10);
    expect(started()).toBe(2);
  });

  it("fails the task of a worker that dies, and the queued task still gets an answer", async () => {
    const { pool } = makePool({ size: 1 });
    const crashing = pool.run({ n: 1, crash: true });
    const queued = pool.run({ n: 4 });
    await expect(crashing).rejects.toThrow(/exit code 3/);
    expect(((await queued) as Reply).value).toBe(8);
  });
});
