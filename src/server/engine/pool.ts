// A small pool of worker threads for CPU-bound calls (the antenna engine): a fixed number of
// workers started on demand, one task per worker at a time, a bounded queue, and a time limit
// that ends a runaway worker and starts a fresh one. Replies are matched by task id.
import type { Worker } from "node:worker_threads";

export interface PoolOptions {
  /** Most workers running at once. */
  size: number;
  /** Starts one worker; each worker answers `{ id, ... }` for every `{ id, ... }` it is sent. */
  start: () => Worker;
  /** A task still running after this long ends its worker and fails with PoolTimeLimitError. */
  timeLimitMs: number;
  /** Tasks allowed to wait for a worker; one more fails at once with PoolBusyError. */
  maxQueued: number;
}

export class PoolTimeLimitError extends Error {
  constructor(readonly timeLimitMs: number) {
    super(`The task did not finish within ${timeLimitMs / 1000} s.`);
    this.name = "PoolTimeLimitError";
  }
}

export class PoolBusyError extends Error {
  constructor() {
    super("Every worker is busy and the queue is full.");
    this.name = "PoolBusyError";
  }
}

interface Task {
  id: number;
  message: Record<string, unknown>;
  resolve: (reply: unknown) => void;
  reject: (error: Error) => void;
}

interface Slot {
  worker: Worker;
  task?: Task;
  timer?: NodeJS.Timeout;
}

export class WorkerPool {
  private readonly slots = new Set<Slot>();
  private readonly queue: Task[] = [];
  private nextId = 1;

  constructor(private readonly options: PoolOptions) {}

  /** Sends `message` (plus an `id`) to a free worker and resolves with its reply. */
  run(message: Record<string, unknown>): Promise<unknown> {
    return new Promise((resolve, reject) => {
      const task: Task = { id: this.nextId++, message, resolve, reject };
      const slot = this.freeSlot();
      if (slot) return this.assign(slot, task);
      if (this.queue.length >= this.options.maxQueued) return reject(new PoolBusyError());
      this.queue.push(task);
    });
  }

  /** Ends every worker; tasks still waiting or running fail. */
  async close(): Promise<void> {
    for (const task of this.queue.splice(0)) task.reject(new Error("The worker pool was closed."));
    const slots = [...this.slots];
    this.slots.clear();
    for (const slot of slots) {
      clearTimeout(slot.timer);
      slot.task?.reject(new Error("The worker pool was closed."));
    }
    await Promise.all(slots.map((slot) => slot.worker.terminate()));
  }

  private freeSlot(): Slot | undefined {
    for (const slot of this.slots) if (!slot.task) return slot;
    return this.slots.size < this.options.size ? this.startSlot() : undefined;
  }

  private startSlot(): Slot {
    const slot: Slot = { worker: this.options.start() };
    this.slots.add(slot);
    slot.worker.on("message", (reply: { id: number }) => {
      const task = slot.task;
      if (!task || reply.id !== task.id) return;
      this.release(slot);
      task.resolve(reply);
    });
    slot.worker.on("error", (error) => this.retire(slot, error));
    slot.worker.on("exit", (code) => this.retire(slot, new Error(`The worker stopped (exit code ${code}).`)));
    // An idle worker must not keep a script or a test run alive; a busy one must.
    slot.worker.unref();
    return slot;
  }

  private assign(slot: Slot, task: Task): void {
    slot.task = task;
    slot.worker.ref();
    slot.timer = setTimeout(() => {
      this.retire(slot, new PoolTimeLimitError(this.options.timeLimitMs));
      void slot.worker.terminate();
    }, this.options.timeLimitMs);
    slot.worker.postMessage({ ...task.message, id: task.id });
  }

  private release(slot: Slot): void {
    clearTimeout(slot.timer);
    slot.task = undefined;
    slot.timer = undefined;
    slot.worker.unref();
    this.dispatch();
  }

  /** Drops a worker that failed, stopped or ran over time; its task fails, the queue moves on. */
  private retire(slot: Slot, error: Error): void {
    if (!this.slots.delete(slot)) return;
    clearTimeout(slot.timer);
    slot.task?.reject(error);
    this.dispatch();
  }

  private dispatch(): void {
    while (this.queue.length > 0) {
      const slot = this.freeSlot();
      if (!slot) return;
      this.assign(slot, this.queue.shift()!);
    }
  }
}
