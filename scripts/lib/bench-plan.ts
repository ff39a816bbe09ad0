/**
 * The plan part of `npm run bench:engine`: the median time of a plan
 * recompute for a half-wave dipole over real ground (target < 20 ms), the way
 * the plan screen recomputes while a slider moves: each run a slightly
 * different height, so nothing is reused between runs.
 */
import { plan } from "../../src/lib/antenna/plan";

const DIPOLE_OVER_AVERAGE_GROUND = {
  family: "dipole",
  band: "20m",
  region: 1,
  wireDiameterMm: 2,
  ground: "average",
  feedline: { type: "rg213", lengthM: 20 },
  transmitter: { powerW: 100, mode: "ssb" },
} as const;

export interface PlanBench {
  runs: number;
  segments: number;
  solves: number;
  cpuMs: number;
  wallMs: number;
}

function median(values: number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  const mid = sorted.length >> 1;
  return sorted.length % 2 === 1 ? sorted[mid] : (sorted[mid - 1] + sorted[mid]) / 2;
}

export function benchPlanRecompute(runs: number): PlanBench {
  const heightAt = (run: number) => 9 + (run % 20) * 0.1;
  const warm = plan({ ...DIPOLE_OVER_AVERAGE_GROUND, heightM: heightAt(0) }); // compile the hot paths once
  const cpu: number[] = [];
  const wall: number[] = [];
  for (let run = 1; run <= runs; run++) {
    const cpuStart = process.cpuUsage();
    const started = performance.now();
    plan({ ...DIPOLE_OVER_AVERAGE_GROUND, heightM: heightAt(run) });
    wall.push(performance.now() - started);
    const used = process.cpuUsage(cpuStart);
    cpu.push((used.user + used.system) / 1000);
  }
  return { runs, segments: warm.model.segments, solves: warm.model.solves, cpuMs: median(cpu), wallMs: median(wall) };
}

/** Print the figure the way the rest of the benchmark prints its own. */
export function printPlanBench(bench: PlanBench): void {
  console.log(
    `(c) dipole plan recompute over average ground (${bench.segments} segments, ${bench.solves} solves: length search and a 41-point sweep)`,
  );
  console.log(
    `  engine: ${bench.cpuMs.toFixed(1)} ms CPU, ${bench.wallMs.toFixed(1)} ms wall, median of ${bench.runs} (target < 20 ms)`,
  );
}
