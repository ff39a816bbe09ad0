// Prints what running the antenna engine in a worker thread costs: the median time of a
// dipole plan computed inline against the same plan through runPlan (worker pool), the first
// call with the worker's start-up, and several plans at once, for the 20 m dipole the tests use.
// Run: npm run bench:plan-route
import { availableParallelism } from "node:os";
import { plan } from "@/lib/antenna/plan";
import { runPlan } from "@/server/engine/run";
import { DIPOLE_20M as dipolePlan } from "../tests/fixtures/plan-requests";

const ROUNDS = 40;
const CONCURRENT = 8;

const median = (values: number[]) => {
  const sorted = [...values].sort((a, b) => a - b);
  const middle = Math.floor(sorted.length / 2);
  return sorted.length % 2 ? sorted[middle] : (sorted[middle - 1] + sorted[middle]) / 2;
};

async function timed(run: () => unknown): Promise<number> {
  const start = performance.now();
  await run();
  return performance.now() - start;
}

/** Inline and worker rounds taken in turn, so that a change in the machine's load hits both alike. */
async function interleavedRounds(): Promise<{ inline: number[]; worker: number[] }> {
  const inline: number[] = [];
  const worker: number[] = [];
  for (let round = 0; round < ROUNDS; round++) {
    inline.push(await timed(() => plan(dipolePlan)));
    worker.push(await timed(() => runPlan(dipolePlan)));
  }
  return { inline, worker };
}

async function main() {
  const firstWorkerCall = await timed(() => runPlan(dipolePlan));
  for (let warm = 0; warm < 5; warm++) plan(dipolePlan);
  for (let warm = 0; warm < 5; warm++) await runPlan(dipolePlan);
  const times = await interleavedRounds();
  const inline = median(times.inline);
  const worker = median(times.worker);
  const overhead = median(times.worker.map((time, round) => time - times.inline[round]));
  // Every worker of the pool as warm as the main thread (V8 optimises a function only once it
  // has run often), then the batches timed in turn, five of each.
  for (let warm = 0; warm < ROUNDS; warm++) await Promise.all(Array.from({ length: availableParallelism() }, () => runPlan(dipolePlan)));
  const batches: { inline: number[]; worker: number[] } = { inline: [], worker: [] };
  for (let batch = 0; batch < 5; batch++) {
    batches.inline.push(
      await timed(() => {
        for (let n = 0; n < CONCURRENT; n++) plan(dipolePlan);
      }),
    );
    batches.worker.push(await timed(() => Promise.all(Array.from({ length: CONCURRENT }, () => runPlan(dipolePlan)))));
  }
  const inlineBatch = median(batches.inline);
  const workerBatch = median(batches.worker);

  const ms = (value: number) => `${value.toFixed(1)} ms`;
  console.log(`Dipole plan (20m, 10 m over average ground), ${ROUNDS} rounds each, ${availableParallelism()} cores`);
  console.log(`  inline, median:                          ${ms(inline)}`);
  console.log(`  through the worker pool, median:         ${ms(worker)}`);
  console.log(`  worker overhead (median of the per-round differences): ${ms(overhead)}`);
  console.log(`  first call, with the worker's start-up:  ${ms(firstWorkerCall)}`);
  console.log(`  ${CONCURRENT} plans one after another, inline, median of 5: ${ms(inlineBatch)}`);
  console.log(`  ${CONCURRENT} plans at once through the pool, median of 5: ${ms(workerBatch)}`);
}

void main();
